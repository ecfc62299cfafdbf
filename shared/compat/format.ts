/**
 * Number formatting for reason sentences, so every row prints its figures the same way.
 * Ranking builds tens of thousands of reasons at a time, and Number#toFixed is a slow runtime
 * call in V8, so fixed-point text is built from a rounded integer instead.
 */

const POW10 = [1, 10, 100, 1_000, 10_000, 100_000, 1_000_000];

/** `value` to `decimals` places, rounding half away from zero; never prints a signed zero. */
export function fixed(value: number, decimals: number): string {
  const scale = POW10[decimals];
  const magnitude = Math.abs(value);
  if (scale === undefined || !(magnitude < 1e15 / scale)) return value.toFixed(decimals);
  const scaled = Math.round(magnitude * scale);
  let digits = String(scaled);
  const sign = value < 0 && scaled !== 0 ? '-' : '';
  if (decimals === 0) return sign + digits;
  if (digits.length <= decimals) digits = '0'.repeat(decimals - digits.length + 1) + digits;
  return `${sign}${digits.slice(0, -decimals)}.${digits.slice(-decimals)}`;
}

export function range(min: number, max: number, decimals: number): string {
  return `${fixed(min, decimals)}–${fixed(max, decimals)}`;
}

/** A dimension as the trade prints it: up to `decimals` places, no trailing zeros (14, 1.25). */
export function compact(value: number, decimals = 2): string {
  const text = fixed(value, decimals);
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}
