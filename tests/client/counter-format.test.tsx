import { describe, expect, it } from 'vitest';
import { formatMeasure, formatMoney, formatNumber, formatPercent, formatRange, UNITS } from '@shared/format';

const NBSP = '\u00a0';

describe('money', () => {
  it('prints integer cents as US dollars', () => {
    expect(formatMoney(4999)).toBe('$49.99');
    expect(formatMoney(749)).toBe('$7.49');
    expect(formatMoney(0)).toBe('$0.00');
    expect(formatMoney(5)).toBe('$0.05');
    expect(formatMoney(123_456_78)).toBe('$123,456.78');
  });

  it('prints a fall in price with its sign', () => {
    expect(formatMoney(-500)).toBe('-$5.00');
  });

  it('refuses a fraction of a cent rather than rounding it away', () => {
    expect(() => formatMoney(12.5)).toThrow(RangeError);
  });
});

describe('spec figures', () => {
  it('prints each unit after a no-break space, without trailing zeros', () => {
    expect(formatMeasure(19, UNITS.mm)).toBe(`19${NBSP}mm`);
    expect(formatMeasure(12.7, UNITS.mm)).toBe(`12.7${NBSP}mm`);
    expect(formatMeasure(1.25, UNITS.mm)).toBe(`1.25${NBSP}mm`);
    expect(formatMeasure(0.5, UNITS.ohm)).toBe(`0.5${NBSP}Ω`);
    expect(formatMeasure(5, UNITS.kohm)).toBe(`5${NBSP}kΩ`);
    expect(formatMeasure(3.4, UNITS.mh)).toBe(`3.4${NBSP}mH`);
    expect(formatMeasure(36, UNITS.kv)).toBe(`36${NBSP}kV`);
    expect(formatMeasure(7.5, UNITS.amp)).toBe(`7.5${NBSP}A`);
  });

  it('rounds to the decimals asked for', () => {
    expect(formatMeasure(0.6666, UNITS.ohm)).toBe(`0.67${NBSP}Ω`);
    expect(formatMeasure(38.04, UNITS.kv, 1)).toBe(`38${NBSP}kV`);
    expect(formatNumber(1000.5, 0)).toBe('1001');
  });

  it('prints a window with one unit, and a window of one value as that value', () => {
    expect(formatRange(0.5, 0.7, UNITS.ohm)).toBe(`0.5–0.7${NBSP}Ω`);
    expect(formatRange(9, 13, UNITS.kohm, 1)).toBe(`9–13${NBSP}kΩ`);
    expect(formatRange(0.6, 0.6, UNITS.ohm)).toBe(`0.6${NBSP}Ω`);
  });

  it('prints a margin in percent with one decimal', () => {
    expect(formatPercent(60.2)).toBe('60.2%');
    expect(formatPercent(49.25)).toBe('49.3%');
  });
});
