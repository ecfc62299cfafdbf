/**
 * The one place the client turns money and spec figures into text, so a price or a reach reads
 * the same on every screen. Money arrives as integer cents; spec figures arrive in the units the
 * trade prints them in (shared/schemas/specs.ts), so nothing here converts, it only prints.
 */

import { formatCents } from '@shared/money';

/** 4999 → "$49.99"; -500 → "-$5.00" — shared/money.ts is the one money printer, server and client. */
export const formatMoney = (cents: number): string => formatCents(cents);

/** The unit symbols a spec figure can carry. */
export const UNITS = {
  ohm: 'Ω',
  kohm: 'kΩ',
  mh: 'mH',
  kv: 'kV',
  amp: 'A',
  mm: 'mm',
  ms: 'ms',
  kpa: 'kPa',
  volt: 'V',
  litre: 'L',
} as const;
export type UnitSymbol = (typeof UNITS)[keyof typeof UNITS];

const numberFormats = new Map<number, Intl.NumberFormat>();
function numberFormat(maxDecimals: number): Intl.NumberFormat {
  let f = numberFormats.get(maxDecimals);
  if (!f) {
    f = new Intl.NumberFormat('en-US', { maximumFractionDigits: maxDecimals, useGrouping: false });
    numberFormats.set(maxDecimals, f);
  }
  return f;
}

/** A plain figure as the trade prints it: no trailing zeros (14, 1.25, 12.7). */
export function formatNumber(value: number, maxDecimals = 2): string {
  return numberFormat(maxDecimals).format(value);
}

// A no-break space keeps "19 mm" on one line in narrow table cells.
const NBSP = '\u00a0';

/** 19, 'mm' → "19 mm"; 0.5, 'Ω' → "0.5 Ω". */
export function formatMeasure(value: number, unit: UnitSymbol, maxDecimals = 2): string {
  return `${formatNumber(value, maxDecimals)}${NBSP}${unit}`;
}

/** A window such as a primary resistance: 0.5, 0.7, 'Ω' → "0.5–0.7 Ω". */
export function formatRange(min: number, max: number, unit: UnitSymbol, maxDecimals = 2): string {
  if (min === max) return formatMeasure(min, unit, maxDecimals);
  return `${formatNumber(min, maxDecimals)}–${formatNumber(max, maxDecimals)}${NBSP}${unit}`;
}

/** 60.2 → "60.2%". */
export function formatPercent(pct: number): string {
  return `${formatNumber(pct, 1)}%`;
}

export const yesNo = (v: boolean): string => (v ? 'yes' : 'no');
