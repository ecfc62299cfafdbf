import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatMoney } from '../../shared/format';
import { MONEY_MAX_CENTS, parseMoney } from '../../shared/money';

const cents = (text: string): number | null => {
  const parsed = parseMoney(text);
  if (!parsed.ok) throw new Error(`${text}: ${parsed.reason}`);
  return parsed.cents;
};
const reason = (text: string): string => {
  const parsed = parseMoney(text);
  return parsed.ok ? 'accepted' : parsed.reason;
};

describe('parseMoney', () => {
  it('reads amounts to exact cents, with no float drift', () => {
    expect(cents('12')).toBe(1200);
    expect(cents('12.5')).toBe(1250);
    expect(cents('0.29')).toBe(29);
    expect(cents('1.10')).toBe(110);
    expect(cents('.5')).toBe(50);
    expect(cents('19.99')).toBe(1999);
    expect(cents(' 7.49 ')).toBe(749);
  });

  it('takes a leading dollar sign and thousands separators', () => {
    expect(cents('$25.00')).toBe(2500);
    expect(cents('$ 25')).toBe(2500);
    expect(cents('1,234.50')).toBe(123450);
    expect(cents('$999,999.99')).toBe(99999999);
    expect(cents('1,234')).toBe(123400);
  });

  it('takes a decimal comma as European spreadsheets write it', () => {
    expect(cents('12,50')).toBe(1250);
    expect(cents('12,5')).toBe(1250);
    expect(cents('1.234,50')).toBe(123450);
  });

  it('is null for an empty cell, for the caller to accept when the amount is optional', () => {
    expect(cents('')).toBeNull();
    expect(cents('   ')).toBeNull();
  });

  it('refuses more than two decimals instead of rounding', () => {
    expect(reason('12.345')).toBe('has more than 2 decimals');
    expect(reason('0.001')).toBe('has more than 2 decimals');
    expect(reason('1,234.567')).toBe('has more than 2 decimals');
  });

  it('refuses negative amounts in every usual spelling', () => {
    for (const text of ['-5', '-5.00', '−5', '-$5', '$-5', '(5.00)', '5-']) {
      expect(reason(text), text).toBe('is negative');
    }
  });

  it('refuses what is not an amount', () => {
    for (const text of ['n/a', 'abc', '12.', '1,23,4', '€5', '5 USD', '+5', '=1+1', '1e3', '12..5', '1,2345.6']) {
      expect(parseMoney(text).ok, text).toBe(false);
    }
  });

  it('refuses amounts above the ceiling', () => {
    expect(reason('1000000.01')).toBe('is too large');
    expect(reason('99999999999')).toBe('is too large');
    expect(cents('1000000.00')).toBe(MONEY_MAX_CENTS);
  });
});

describe('formatMoney', () => {
  it('prints dollars with grouping, or plain for exports', () => {
    expect(formatMoney(123450)).toBe('$1,234.50');
    expect(formatMoney(5)).toBe('$0.05');
    expect(formatMoney(-500)).toBe('-$5.00');
    expect(formatMoney(123450, { symbol: '', grouping: false })).toBe('1234.50');
  });

  it('refuses a fraction of a cent', () => {
    expect(() => formatMoney(1.5)).toThrow(RangeError);
  });

  it('round-trips through parseMoney for every amount up to the ceiling', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: MONEY_MAX_CENTS }), fc.boolean(), (c, grouping) => {
        expect(cents(formatMoney(c, { grouping }))).toBe(c);
      }),
      { numRuns: 3000, seed: 7 },
    );
  });
});
