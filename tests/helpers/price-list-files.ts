import { randomUUID } from 'node:crypto';
import { gtinCheckDigit } from '../../shared/gtin';

/** The store's main layout (seed/csv/README.md). */
export const STANDARD_HEADER = ['Part Number', 'Brand', 'Description', 'Cost', 'List', 'Core', 'Pack Qty', 'GTIN', 'Supersedes', 'Kind'];

/** Not one of ours in the demo data, so parts the bulk tests create stay out of the Counter's search index. */
export const BULK_BRAND = 'Calder Ignition';

export type Cell = string | number | null;

/** CSV as a supplier's spreadsheet writes it: quotes only where needed, no formula escaping (that is the server's job). */
export function csv(rows: readonly (readonly Cell[])[], opts: { delimiter?: string; eol?: string } = {}): string {
  const delimiter = opts.delimiter ?? ',';
  const eol = opts.eol ?? '\n';
  const cell = (v: Cell): string => {
    const s = v === null ? '' : String(v);
    return s.includes(delimiter) || /["\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
  };
  return rows.map((r) => r.map(cell).join(delimiter)).join(eol) + eol;
}

/** A valid GTIN-13 from a 12-digit body, in the GS1 restricted-circulation range 200–299 as the samples use. */
export function gtin(body12: string): string {
  return `${body12}${gtinCheckDigit(body12)}`;
}

export const dollars = (cents: number): string => (cents / 100).toFixed(2);

/** A short upper-case tag that makes invented part numbers unique to one test run. */
export function runTag(): string {
  return randomUUID().slice(0, 6).toUpperCase();
}

export interface BulkRow {
  partNumber: string;
  costCents: number;
  listCents: number;
}

/** n invented coils of BULK_BRAND; `version` moves every price, so two versions differ on every line. */
export function bulkRows(tag: string, n: number, version: number): BulkRow[] {
  return Array.from({ length: n }, (_, i) => {
    const costCents = 1000 + ((i * 7 + version * 131) % 5000);
    return { partNumber: `CI-${tag}-${String(i).padStart(6, '0')}`, costCents, listCents: costCents * 2 + 99 };
  });
}

export function bulkCsv(rows: readonly BulkRow[]): string {
  return csv([
    STANDARD_HEADER,
    ...rows.map((r) => [
      r.partNumber,
      BULK_BRAND,
      'Ignition coil, canister',
      dollars(r.costCents),
      dollars(r.listCents),
      '0.00',
      1,
      null,
      null,
      'coil',
    ]),
  ]);
}

/** Seeded random numbers (mulberry32), so a failing corpus file can be made again from its seed. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
