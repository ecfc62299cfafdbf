/**
 * The one place a number, an amount, a date or a stock level becomes text, for the client's
 * screens and the server's messages and e-mails alike, so each reads the same everywhere.
 * Figures arrive in the units the trade prints them in (shared/schemas/specs.ts), money as
 * integer cents: nothing here converts, it only prints. (The compatibility model's reason
 * sentences keep their own fast fixed-point printer in shared/compat/format.ts.)
 */

/** A no-break space keeps "0.62 Ω" on one line in narrow table cells. */
export const NBSP = '\u00a0';

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
  L: 1,
  '%': 0,
  '°': 0,
  '°C': 1,
  K: 0,
  ':1': 1,
};

export const decimalsFor = (unit: string): number => DECIMALS[unit] ?? 2;

const numberFormats = new Map<string, Intl.NumberFormat>();
function numberFormat(maxDecimals: number, minDecimals: number): Intl.NumberFormat {
  const key = `${minDecimals}-${maxDecimals}`;
  let f = numberFormats.get(key);
  if (!f) {
    f = new Intl.NumberFormat('en-US', { minimumFractionDigits: minDecimals, maximumFractionDigits: maxDecimals, useGrouping: false });
    numberFormats.set(key, f);
  }
  return f;
}

/** A plain figure: no trailing zeros beyond `minDecimals`, a true minus sign (14, 1.25, −3.5). */
export function formatNumber(value: number, maxDecimals = 2, minDecimals = 0): string {
  const text = numberFormat(maxDecimals, Math.min(minDecimals, maxDecimals)).format(value);
  // Intl prints "-0" for a tiny negative rounded away.
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text.replace('-', '−');
}

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

/** A window, both ends to the same places: 0.5, 0.7 → "0.5–0.7 Ω"; 0.5, 0.66 → "0.50–0.66 Ω"; 1, 1 → "1 mm". */
export function formatRange(min: number, max: number, unit: string, maxDecimals = decimalsFor(unit)): string {
  if (min === max) return formatMeasure(min, unit, maxDecimals);
  const places = Math.max(placesOf(formatNumber(min, maxDecimals)), placesOf(formatNumber(max, maxDecimals)));
  return `${formatNumber(min, places, places)}–${formatNumber(max, places, places)}${NBSP}${unit}`;
}

/** 60.2 → "60.2%": a share of something, one decimal at most. */
export const formatPercent = (pct: number): string => `${formatNumber(pct, 1)}%`;

const signedPercent = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1, minimumFractionDigits: 1, signDisplay: 'exceptZero' });

/** A move in percent: 18.75 → "+18.8%", -2.59 → "−2.6%", 0 → "0.0%". */
export const formatPercentChange = (value: number): string => `${signedPercent.format(value).replace('-', '−')}%`;

const grouped = new Intl.NumberFormat('en-US');

/** A count of things: 12345 → "12,345". */
export const formatCount = (n: number): string => grouped.format(n);

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${formatNumber(bytes / 1024, 0)} KB`;
  return `${formatNumber(bytes / (1024 * 1024), 1)} MB`;
}

export const yesNo = (v: boolean): string => (v ? 'yes' : 'no');

export interface FormatMoneyOptions {
  /** Printed before the amount; '' for machine-readable exports. */
  symbol?: string;
  /** Thousands separators; off for machine-readable exports. */
  grouping?: boolean;
}

/**
 * Integer cents as an amount: 123450 → "$1,234.50"; -500 → "-$5.00" (a price change can go
 * down). A fraction of a cent is refused rather than rounded away.
 */
export function formatMoney(cents: number, opts: FormatMoneyOptions = {}): string {
  if (!Number.isSafeInteger(cents)) throw new RangeError(`cents must be an integer, got ${cents}`);
  const { symbol = '$', grouping = true } = opts;
  const abs = Math.abs(cents);
  const whole = String(Math.floor(abs / 100));
  const groupedWhole = grouping ? whole.replace(/\B(?=(\d{3})+$)/g, ',') : whole;
  const fraction = String(abs % 100).padStart(2, '0');
  return `${cents < 0 ? '-' : ''}${symbol}${groupedWhole}.${fraction}`;
}

// Built from parts so the month reads "Sep" whatever the ICU version says for en-GB ("Sept").
const dateParts = new Intl.DateTimeFormat('en-US', { day: 'numeric', month: 'short', year: 'numeric' });
const timeParts = new Intl.DateTimeFormat('en-US', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });

// A calendar day ("2026-12-04", a price's effective date) is that day wherever the reader is;
// Date would read it as UTC midnight, the evening before west of Greenwich.
const DAY_ONLY = /^\d{4}-\d{2}-\d{2}$/;

const toDate = (when: Date | string): Date | null => {
  const d = typeof when === 'string' ? new Date(DAY_ONLY.test(when) ? `${when}T00:00:00` : when) : when;
  return Number.isNaN(d.getTime()) ? null : d;
};

function dayText(d: Date): string {
  const part = (type: Intl.DateTimeFormatPartTypes) => dateParts.formatToParts(d).find((p) => p.type === type)?.value ?? '';
  return `${part('day')} ${part('month')} ${part('year')}`;
}

function timeText(d: Date): string {
  const parts = timeParts.formatToParts(d);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  return `${part('hour')}:${part('minute')}`;
}

/** The app's one date format: "4 Dec 2026" (in the reader's time zone). Text that is no date is returned as given. */
export function formatDate(when: Date | string): string {
  const d = toDate(when);
  return d ? dayText(d) : String(when);
}

/** The app's one date-and-time format: "4 Dec 2026, 15:04" (24-hour clock). */
export function formatDateTime(when: Date | string): string {
  const d = toDate(when);
  return d ? `${dayText(d)}, ${timeText(d)}` : String(when);
}

/** The time of day alone, for something that happened today: "15:04". */
export function formatTime(when: Date | string): string {
  const d = toDate(when);
  return d ? timeText(d) : String(when);
}

/** The other stores' counts, most first: "3 at Eastgate · 1 at Millbrook"; empty when none holds any. */
export function formatElsewhere(elsewhere: readonly { name: string; onHand: number }[]): string {
  return elsewhere.map((s) => `${formatCount(s.onHand)} at ${s.name}`).join(' · ');
}

/** A part's stock across the chain in one line, this store first: "0 here · 3 at Eastgate". */
export function formatChainStock(stock: {
  here: { onHand: number } | null;
  elsewhere: readonly { name: string; onHand: number }[];
}): string {
  return [`${formatCount(stock.here?.onHand ?? 0)} here`, formatElsewhere(stock.elsewhere)].filter(Boolean).join(' · ');
}

/**
 * Stock as the store's staff read it, "14 on hand · bin A-3"; as a shop's technician sees it
 * (no count), "in stock" or "not in stock".
 */
export function formatStock(stock: { onHand?: number | undefined; bin?: string | null | undefined; inStock: boolean }): string {
  if (stock.onHand === undefined) return stock.inStock ? 'in stock' : 'not in stock';
  const bin = stock.bin ? ` · bin ${stock.bin}` : '';
  return `${formatCount(stock.onHand)} on hand${bin}`;
}
