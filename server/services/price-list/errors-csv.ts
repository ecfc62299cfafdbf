import type { Writable } from 'node:stream';
import type { DataSource } from 'typeorm';
import { toCsv } from '../../../shared/price-list/csv-escape';
import type { PriceListField } from '../../../shared/price-list/fields';
import { validateMapping } from '../../../shared/price-list/mapping';
import { formatMoney } from '../../../shared/format';
import { AppError } from '../../errors';
import { errorLinesAfter, type ErrorLine } from '../../repositories/price-list-rows.repository';
import { stagedFacts } from '../../repositories/price-lists.repository';

/** Rejected lines fetched per query while the download streams. */
const BATCH = 2000;

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
  const list = await stagedFacts(ds.manager, listId);
  if (!list) throw AppError.notFound('Price list');
  const check = validateMapping(list.columns, list.mapping);
  const fieldAt = new Map<number, PriceListField>();
  if (check.ok) for (const [field, index] of Object.entries(check.resolved.columns)) fieldAt.set(index, field as PriceListField);

  // A byte-order mark, so a spreadsheet opens the file as UTF-8.
  out.write(`\uFEFF${toCsv([['Line', 'Column', 'Reason', ...list.columns]])}`);
  let after: [number, string] = [0, '0'];
  for (;;) {
    const rows = await errorLinesAfter(ds.manager, listId, after, BATCH);
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

/** The download's name: the uploaded file's, marked as its rejected lines. */
export function errorsCsvFileName(uploadedName: string): string {
  return `${uploadedName.replace(/\.[^.]*$/, '') || 'price-list'}-rejected.csv`;
}
