/**
 * How the price-list screens print money, price moves, times and file hashes. Money arrives as
 * integer cents.
 */

import { formatCents } from '@shared/money';

const pct = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1, minimumFractionDigits: 1, signDisplay: 'exceptZero' });
const when = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeStyle: 'short' });
const count = new Intl.NumberFormat('en-US');

/** 4999 → "$49.99", through the one money printer in shared/money.ts. */
export const formatMoney = (cents: number): string => formatCents(cents);

/** The move from one price to another in percent of the old one, or null when there is no old one. */
export function percentChange(oldCents: number | null, newCents: number): number | null {
  if (oldCents === null || oldCents === 0) return null;
  return ((newCents - oldCents) / oldCents) * 100;
}

/** 18.75 → "+18.8%", -2.59 → "−2.6%", 0 → "0.0%". The minus is a real minus sign. */
export function formatPercentChange(value: number): string {
  return `${pct.format(value).replace('-', '\u2212')}%`;
}

export function formatCount(n: number): string {
  return count.format(n);
}

export function formatWhen(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : when.format(d);
}

/** The first 12 hex digits, enough to tell two files apart by eye. */
export const shortHash = (sha256: string): string => sha256.slice(0, 12);

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}
