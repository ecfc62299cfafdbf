/**
 * The one place a compatibility figure becomes text: a check row's number with its unit, a load
 * point's kilovolts, a bench reading. Figures arrive in the units the trade prints them in
 * (shared/schemas/specs.ts and the check rows of shared/compat), so nothing here converts.
 */

// A no-break space keeps "0.62 Ω" on one line in narrow table cells.
export const NBSP = '\u00a0';

/** How many decimals each unit is printed with, at most (trailing zeros dropped). */
const DECIMALS: Record<string, number> = {
  Ω: 2,
  kΩ: 1,
  mH: 2,
  A: 1,
  mJ: 1,
  kV: 1,
  V: 1,
  ms: 1,
  mm: 2,
  kPa: 0,
  '%': 0,
  '°': 0,
  '°C': 1,
  K: 0,
  ':1': 1,
};

const formats = new Map<string, Intl.NumberFormat>();
function numberFormat(maxDecimals: number, minDecimals = 0): Intl.NumberFormat {
  const key = `${minDecimals}-${maxDecimals}`;
  let f = formats.get(key);
  if (!f) {
    f = new Intl.NumberFormat('en-US', { minimumFractionDigits: minDecimals, maximumFractionDigits: maxDecimals, useGrouping: false });
    formats.set(key, f);
  }
  return f;
}

/** A plain figure: no trailing zeros beyond `minDecimals`, a true minus sign (14, 1.25, −3.5). */
export function formatNumber(value: number, maxDecimals = 2, minDecimals = 0): string {
  const text = numberFormat(maxDecimals, Math.min(minDecimals, maxDecimals)).format(value);
  // Intl prints "-0" for a tiny negative rounded away.
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text.replace('-', '−');
}

export const decimalsFor = (unit: string): number => DECIMALS[unit] ?? 2;

/** 0.62, 'Ω' → "0.62 Ω"; 90, ':1' → "90:1"; 6, 'heat step' → "step 6"; 41.2, '%' → "41 %". */
export function formatMeasure(value: number, unit: string, maxDecimals = decimalsFor(unit)): string {
  const n = formatNumber(value, maxDecimals);
  if (unit === '') return n;
  if (unit === ':1') return `${n}:1`;
  if (unit === 'heat step') return `step${NBSP}${n}`;
  return `${n}${NBSP}${unit}`;
}

/** A check row's figure: a number with its unit, a text as given (with its unit), or a dash for none. */
export function formatFigure(value: number | string | null, unit: string): string {
  if (value === null) return '—';
  if (typeof value === 'number') return formatMeasure(value, unit);
  if (unit === '' || unit === 'heat step') return value;
  return unit === ':1' ? `${value}:1` : `${value}${NBSP}${unit}`;
}

const placesOf = (text: string): number => (text.includes('.') ? text.length - text.indexOf('.') - 1 : 0);

/** A window such as a primary resistance, both ends to the same places: 0.5, 0.7 → "0.5–0.7 Ω"; 0.5, 0.66 → "0.50–0.66 Ω". */
export function formatRange(min: number, max: number, unit: string): string {
  const d = decimalsFor(unit);
  if (min === max) return formatMeasure(min, unit, d);
  const places = Math.max(placesOf(formatNumber(min, d)), placesOf(formatNumber(max, d)));
  return `${formatNumber(min, places, places)}–${formatNumber(max, places, places)}${NBSP}${unit}`;
}
