import fc from 'fast-check';
import { isValid } from 'gtin';
import { describe, expect, it } from 'vitest';
import { gtinCheckDigit, isValidGtin } from '../../shared/gtin';

describe('gtinCheckDigit', () => {
  it('gives 3 for 629104150021, the worked example of GS1 "How to calculate a check digit manually" (gs1.org)', () => {
    expect(gtinCheckDigit('629104150021')).toBe(3);
    expect(isValidGtin('6291041500213')).toBe(true);
  });

  it('is not changed by leading zeros, so a GTIN-12 padded to 14 digits keeps its check digit', () => {
    expect(gtinCheckDigit('03600029145')).toBe(gtinCheckDigit('0003600029145'));
  });

  it('refuses a body that is not digits', () => {
    expect(() => gtinCheckDigit('12a4')).toThrow();
  });
});

describe('isValidGtin', () => {
  it('takes 8, 12, 13 and 14 digits and nothing else', () => {
    expect(isValidGtin('96385074')).toBe(true);
    expect(isValidGtin('036000291452')).toBe(true);
    expect(isValidGtin('00036000291452')).toBe(true);
    expect(isValidGtin('6291041500214')).toBe(false);
    expect(isValidGtin('3600029145')).toBe(false);
    expect(isValidGtin('629104150021 3')).toBe(false);
    expect(isValidGtin('')).toBe(false);
  });

  it('agrees with the gtin package on random codes of every GTIN length', () => {
    const code = fc.constantFrom(8, 12, 13, 14).chain((n) => fc.stringMatching(new RegExp(`^\\d{${n}}$`)));
    fc.assert(
      fc.property(code, (c) => {
        expect(isValidGtin(c)).toBe(isValid(c));
      }),
      { numRuns: 4000, seed: 20261001 },
    );
  });

  it('agrees with the gtin package on codes built valid, then with the last digit changed', () => {
    const body = fc.constantFrom(7, 11, 12, 13).chain((n) => fc.stringMatching(new RegExp(`^\\d{${n}}$`)));
    fc.assert(
      fc.property(body, fc.integer({ min: 1, max: 9 }), (b, shift) => {
        const good = `${b}${gtinCheckDigit(b)}`;
        const bad = `${b}${(gtinCheckDigit(b) + shift) % 10}`;
        expect(isValidGtin(good)).toBe(true);
        expect(isValid(good)).toBe(true);
        expect(isValidGtin(bad)).toBe(false);
        expect(isValid(bad)).toBe(false);
      }),
      { numRuns: 2000, seed: 42 },
    );
  });
});
