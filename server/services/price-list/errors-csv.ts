import type { Writable } from 'node:stream';
import type { DataSource } from 'typeorm';
import { toCsv } from '../../../shared/price-list/csv-escape';
import type { PriceListField } from '../../../shared/price-list/fields';
import { validateMapping, type Mapping } from '../../../shared/price-list/mapping';
import { formatMoney } from '../../../shared/format';
import { AppError } from '../../errors';

/** Rejected lines fetched per query while the download streams. */
const BATCH = 2000;

interface ErrorLine {
  id: string;
  line: number;
  column: string | null;
  message: string;
  raw: string[] | null;
  part_number: string | null;
  brand: string | null;
  description: string | null;
  cost_cents: number | null;
  list_cents: number | null;
  core_cents: number | null;
  pack_qty: number | null;
  gtin: string | null;
  supersedes: string | null;
  kind: string | null;
  coil: Record<string, unknown> | null;
  plug: Record<string, unknown> | null;
}

// A line rejected by the parser kept its cells; one rejected later (a duplicate's first line, an
// unknown brand) was staged, and its cells are rebuilt from the staged values.
const BATCH_SQL = `
SELECT e.id, e.line, e."column", e.message,
       coalesce(e.raw, (SELECT e2.raw FROM price_list_row_error e2
                         WHERE e2.price_list_id = e.price_list_id AND e2.line = e.line AND e2.raw IS NOT NULL LIMIT 1)) AS raw,
       r.part_number, r.brand, r.description, r.cost_cents, r.list_cents, r.core_cents, r.pack_qty, r.gtin, r.supersedes, r.kind, r.coil, r.plug
  FROM price_list_row_error e
  LEFT JOIN price_list_row r ON r.price_list_id = e.price_list_id AND r.line = e.line
 WHERE e.price_list_id = $1 AND (e.line, e.id) > ($2, $3::bigint)
 ORDER BY e.line, e.id
 LIMIT ${BATCH}`;

/** True once the reader took what was written; false when it went away (the download was cancelled). */
function drained(out: Writable): Promise<boolean> {
  return new Promise((resolve) => {
    const done = (ok: boolean) => () => {
      out.off('drain', onDrain);
      out.off('close', onClose);
      resolve(ok);
    };
    const onDrain = done(true);
    const onClose = done(false);
    out.on('drain', onDrain);
    out.on('close', onClose);
  });
}

const money = (cents: number | null): string => (cents === null ? '' : formatMoney(cents, { symbol: '', grouping: false }));

function stagedValue(e: ErrorLine, field: PriceListField): string {
  switch (field) {
    case 'partNumber':
      return e.part_number ?? '';
    case 'brand':
      return e.brand ?? '';
    case 'description':
      return e.description ?? '';
    case 'cost':
      return money(e.cost_cents);
    case 'list':
      return money(e.list_cents);
    case 'core':
      return money(e.core_cents);
    case 'packQty':
      return e.pack_qty === null ? '' : String(e.pack_qty);
    case 'gtin':
      return e.gtin ?? '';
    case 'supersedes':
      return e.supersedes ?? '';
    case 'kind':
      return e.kind ?? '';
    default: {
      const value = e.coil?.[field] ?? e.plug?.[field];
      return value === undefined || value === null ? '' : String(value);
    }
  }
}

/**
 * GET /api/price-lists/:id/errors.csv: one line per reason — line, column, reason, then the
 * line's cells under the file's own headers. Every cell goes through toCsv, which defuses
 * formulas (=, +, -, @) so a spreadsheet shows supplier text instead of running it.
 */
export async function writeErrorsCsv(ds: DataSource, listId: string, out: Writable): Promise<void> {
  const lists = (await ds.query(`SELECT columns, mapping FROM price_list WHERE id = $1`, [listId])) as {
    columns: string[];
    mapping: Mapping;
  }[];
  const list = lists[0];
  if (!list) throw AppError.notFound('Price list');
  const check = validateMapping(list.columns, list.mapping);
  const fieldAt = new Map<number, PriceListField>();
  if (check.ok) for (const [field, index] of Object.entries(check.resolved.columns)) fieldAt.set(index, field as PriceListField);

  // A byte-order mark, so a spreadsheet opens the file as UTF-8.
  out.write(`\uFEFF${toCsv([['Line', 'Column', 'Reason', ...list.columns]])}`);
  let after: [number, string] = [0, '0'];
  for (;;) {
    const rows = (await ds.query(BATCH_SQL, [listId, after[0], after[1]])) as ErrorLine[];
    if (rows.length === 0) break;
    const csv = toCsv(
      rows.map((e) => {
        const cells =
          e.raw ??
          list.columns.map((_, i) => {
            const field = fieldAt.get(i);
            return field !== undefined && e.part_number !== null ? stagedValue(e, field) : '';
          });
        return [e.line, e.column, e.message, ...cells];
      }),
    );
    if (!out.write(csv) && !(await drained(out))) return;
    const last = rows.at(-1);
    if (last === undefined) break;
    after = [last.line, last.id];
  }
}
