/**
 * Money as integer cents. Amounts are parsed from their digits, never through a float, so
 * "0.29" is 29 cents exactly. Up to two decimals are accepted and more are refused rather than
 * rounded: a third decimal in a price list is a unit or a typo, and guessing it moves a price.
 */

/** $1,000,000.00: far above any ignition part, and it keeps cents inside a 32-bit column. */
export const MONEY_MAX_CENTS = 100_000_000;

export type MoneyParse = { ok: true; cents: number | null } | { ok: false; reason: string };

// 1234 | 1,234 | 1,234,567 | .5, with an optional decimal point and one or two decimals.
const POINT_DECIMAL = /^(\d{1,3}(?:,\d{3})+|\d+|(?=\.\d))(?:\.(\d{1,2}))?$/;
// Decimal comma as European exports write it: 12,50 | 1.234,50. Needs the comma to be told
// apart from the grouping above; "1,234" therefore stays one thousand two hundred thirty-four.
const COMMA_DECIMAL = /^(\d{1,3}(?:\.\d{3})+|\d+),(\d{1,2})$/;
const TOO_MANY_DECIMALS = /^[\d,.]*[.,]\d{3,}$/;
// -5, −5 (Unicode minus), -$5, (5.00) as accountants write it, 5- as some ledgers do.
const NEGATIVE = /^[-−(]|-$|\)$/;

/**
 * Parses "12.5", "$1,234.50", "12,50" to cents. Empty (or blank) is `cents: null`, for the
 * caller to accept when the amount is optional. Negative amounts are refused.
 * Printing an amount is `formatMoney` in shared/format.ts.
 */
export function parseMoney(text: string): MoneyParse {
  const plain = plainCents(text);
  if (plain !== -1) return { ok: true, cents: plain };
  let s = text.trim();
  if (s === '') return { ok: true, cents: null };
  if (s.startsWith('$')) s = s.slice(1).trimStart();
  if (NEGATIVE.test(s)) return { ok: false, reason: 'is negative' };
  const m = POINT_DECIMAL.exec(s) ?? COMMA_DECIMAL.exec(s);
  if (!m) {
    if (TOO_MANY_DECIMALS.test(s)) return { ok: false, reason: 'has more than 2 decimals' };
    return { ok: false, reason: 'is not an amount' };
  }
  const whole = (m[1] ?? '').replace(/[.,]/g, '');
  if (whole.length > 9) return { ok: false, reason: 'is too large' };
  const fraction = (m[2] ?? '').padEnd(2, '0');
  const cents = Number(whole) * 100 + Number(fraction);
  if (cents > MONEY_MAX_CENTS) return { ok: false, reason: 'is too large' };
  return { ok: true, cents };
}

/**
 * The common case, "1234" or "12.5" or "12.50", read digit by digit without a regex or a
 * temporary string: a price list has two or three amounts on every line. -1 means "not this
 * simple form", and the general parser decides.
 */
function plainCents(s: string): number {
  const n = s.length;
  if (n === 0 || n > 12) return -1;
  let whole = 0;
  let i = 0;
  for (; i < n; i++) {
    const c = s.charCodeAt(i);
    if (c === 46) break;
    if (c < 48 || c > 57) return -1;
    whole = whole * 10 + (c - 48);
  }
  if (i === 0) return -1;
  let fraction = 0;
  const decimals = n - i - 1;
  if (i < n) {
    if (decimals < 1 || decimals > 2) return -1;
    for (let j = i + 1; j < n; j++) {
      const c = s.charCodeAt(j);
      if (c < 48 || c > 57) return -1;
      fraction = fraction * 10 + (c - 48);
    }
    if (decimals === 1) fraction *= 10;
  }
  const cents = whole * 100 + fraction;
  return cents <= MONEY_MAX_CENTS ? cents : -1;
}
