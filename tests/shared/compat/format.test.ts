import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compact, fixed, range } from '../../../shared/compat/format';

describe('reason number formatting', () => {
  it('prints fixed places like toFixed, but never a signed zero', () => {
    expect(fixed(0.6913, 3)).toBe('0.691');
    expect(fixed(24.2635, 1)).toBe('24.3');
    expect(fixed(64.856, 0)).toBe('65');
    expect(fixed(-5.4, 0)).toBe('-5');
    expect(fixed(-0.004, 2)).toBe('0.00');
    expect(fixed(0.05, 2)).toBe('0.05');
    expect(fixed(1e20, 1)).toBe((1e20).toFixed(1));
    expect(range(0.45, 0.77, 2)).toBe('0.45–0.77');
    expect(compact(14)).toBe('14');
    expect(compact(1.25)).toBe('1.25');
    expect(compact(20.8)).toBe('20.8');
  });

  it('agrees with toFixed away from exact halves', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: 0, max: 3 }), (value, decimals) => {
        const scaled = Math.abs(value) * 10 ** decimals;
        fc.pre(Math.abs(scaled - Math.floor(scaled) - 0.5) > 1e-6);
        fc.pre(Math.round(scaled) !== 0 || value >= 0);
        expect(fixed(value, decimals)).toBe(value.toFixed(decimals));
      }),
    );
  });
});
