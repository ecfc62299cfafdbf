import { z } from 'zod';
import {
  SUPERSESSION_STATES,
  type PriceListChangeSort,
  type PriceListChangesQuery,
  type PriceListErrorSort,
  type PriceListErrorsQuery,
} from '../../shared/schemas/price-lists';
import { execute, queryCount, queryIds, queryRows, type Executor } from '../db/executor';
import { partKindSchema } from './parts.repository';

/** A list's staged rows (price_list_row) and its rejected lines (price_list_row_error). */

const changeRowSchema = z.object({
  line: z.number().int(),
  change: z.enum(['new', 'changed', 'unchanged']),
  part_id: z.string().nullable(),
  part_number: z.string(),
  catalog_number: z.string().nullable(),
  brand: z.string(),
  description: z.string().nullable(),
  kind: partKindSchema.nullable(),
  part_kind: partKindSchema.nullable(),
  old_cost_cents: z.number().int().nullable(),
  cost_cents: z.number().int(),
  old_list_cents: z.number().int().nullable(),
  list_cents: z.number().int(),
  old_core_cents: z.number().int().nullable(),
  core_cents: z.number().int().nullable(),
  old_pack_qty: z.number().int().nullable(),
  pack_qty: z.number().int().nullable(),
  cost_change_pct: z.number().nullable(),
  list_change_pct: z.number().nullable(),
  flagged: z.boolean(),
  has_spec: z.boolean(),
  supersedes: z.string().nullable(),
  supersession: z.enum(SUPERSESSION_STATES).nullable(),
});
export type ChangeRow = z.infer<typeof changeRowSchema>;

const CHANGE_COLUMNS = `line, change, part_id, part_number, brand, description, kind, part_kind, old_cost_cents, cost_cents,
  old_list_cents, list_cents, old_core_cents, core_cents, old_pack_qty, pack_qty, cost_change_pct, list_change_pct, flagged,
  (coil IS NOT NULL OR plug IS NOT NULL) AS has_spec, supersedes, supersession,
  (SELECT p.part_number FROM part p WHERE p.id = price_list_row.part_id) AS catalog_number`;

// The query schema allows only these keys; each names its SQL here, so nothing from the query
// string reaches the statement. Ties go in file order; a row without a move sorts last either way.
const CHANGE_ORDER: Record<PriceListChangeSort, string> = {
  line: 'line',
  partNumber: 'part_number_norm',
  cost: 'cost_cents',
  list: 'list_cents',
  costChange: 'cost_change_pct',
  listChange: 'list_change_pct',
};
const ERROR_ORDER: Record<PriceListErrorSort, string> = { line: 'line', column: '"column"' };
const DIRECTION = { asc: 'ASC', desc: 'DESC' } as const;

/** Rows of the preview tables, sorted as asked (file order by default), with the count of all that match. */
export async function listChangeRows(
  ex: Executor,
  listId: string,
  q: PriceListChangesQuery,
): Promise<{ rows: ChangeRow[]; total: number }> {
  const conditions = [`price_list_id = $1`, `NOT retracted`, `change IN ('new', 'changed', 'unchanged')`];
  const params: unknown[] = [listId];
  if (q.type === 'supersession') conditions.push(`supersedes_norm IS NOT NULL`);
  else if (q.type) {
    params.push(q.type);
    conditions.push(`change = $${params.length}`);
  }
  if (q.flagged) conditions.push(q.flagged === 'true' ? `flagged` : `NOT flagged`);
  const where = conditions.join(' AND ');
  // limit and offset are integers checked by the query schema.
  const rows = await queryRows(
    ex,
    changeRowSchema,
    `SELECT ${CHANGE_COLUMNS} FROM price_list_row WHERE ${where}
      ORDER BY ${CHANGE_ORDER[q.sort]} ${DIRECTION[q.dir]} NULLS LAST, line
      LIMIT ${q.limit} OFFSET ${q.offset}`,
    params,
  );
  return { rows, total: await queryCount(ex, `SELECT count(*)::int AS n FROM price_list_row WHERE ${where}`, params) };
}

const rowErrorRowSchema = z.object({
  line: z.number().int(),
  column: z.string().nullable(),
  field: z.string().nullable(),
  message: z.string(),
});
export type RowErrorRow = z.infer<typeof rowErrorRowSchema>;

export async function listRowErrorRows(
  ex: Executor,
  listId: string,
  q: PriceListErrorsQuery,
): Promise<{ rows: RowErrorRow[]; total: number }> {
  const rows = await queryRows(
    ex,
    rowErrorRowSchema,
    `SELECT line, "column", field, message FROM price_list_row_error WHERE price_list_id = $1
      ORDER BY ${ERROR_ORDER[q.sort]} ${DIRECTION[q.dir]} NULLS LAST, line, id LIMIT $2 OFFSET $3`,
    [listId, q.limit, q.offset],
  );
  return { rows, total: await queryCount(ex, `SELECT count(*)::int AS n FROM price_list_row_error WHERE price_list_id = $1`, [listId]) };
}

/** The staged rows and the reasons of a list, before it is read again or when it is discarded. */
export async function deleteStagedRows(ex: Executor, listId: string, what: { errors: boolean }): Promise<void> {
  await execute(ex, `DELETE FROM price_list_row WHERE price_list_id = $1`, [listId]);
  if (what.errors) await execute(ex, `DELETE FROM price_list_row_error WHERE price_list_id = $1`, [listId]);
}

/** The first lines of parts the file has twice: kept for the record, left out of everything else. */
export async function retractLines(ex: Executor, listId: string, lines: readonly number[]): Promise<void> {
  if (!lines.length) return;
  await execute(ex, `UPDATE price_list_row SET retracted = true WHERE price_list_id = $1 AND line = ANY($2::int[])`, [listId, lines]);
}

export interface RowErrorEntry {
  line: number;
  column: string | null;
  field: string | null;
  message: string;
  raw: string[] | null;
}

/** Rejected-line reasons from the file, in one statement per batch. */
export async function insertFileRowErrors(ex: Executor, listId: string, entries: readonly RowErrorEntry[]): Promise<void> {
  if (entries.length === 0) return;
  await execute(
    ex,
    `INSERT INTO price_list_row_error (price_list_id, line, "column", field, message, raw, source)
     SELECT $1, x.line, x."column", x.field, x.message, x.raw, 'file'
       FROM jsonb_to_recordset($2::jsonb) AS x(line integer, "column" text, field text, message text, raw jsonb)`,
    [listId, JSON.stringify(entries)],
  );
}

const specJson = z.record(z.string(), z.unknown()).nullable();
const errorLineSchema = z.object({
  id: z.string(),
  line: z.number().int(),
  column: z.string().nullable(),
  message: z.string(),
  raw: z.array(z.string()).nullable(),
  part_number: z.string().nullable(),
  brand: z.string().nullable(),
  description: z.string().nullable(),
  cost_cents: z.number().int().nullable(),
  list_cents: z.number().int().nullable(),
  core_cents: z.number().int().nullable(),
  pack_qty: z.number().int().nullable(),
  gtin: z.string().nullable(),
  supersedes: z.string().nullable(),
  kind: z.string().nullable(),
  coil: specJson,
  plug: specJson,
});
export type ErrorLine = z.infer<typeof errorLineSchema>;

// A line rejected by the parser kept its cells; one rejected later (a duplicate's first line, an
// unknown brand) was staged, and its cells are rebuilt from the staged values.
const ERROR_LINES_SQL = `
SELECT e.id, e.line, e."column", e.message,
       coalesce(e.raw, (SELECT e2.raw FROM price_list_row_error e2
                         WHERE e2.price_list_id = e.price_list_id AND e2.line = e.line AND e2.raw IS NOT NULL LIMIT 1)) AS raw,
       r.part_number, r.brand, r.description, r.cost_cents, r.list_cents, r.core_cents, r.pack_qty, r.gtin, r.supersedes, r.kind, r.coil, r.plug
  FROM price_list_row_error e
  LEFT JOIN price_list_row r ON r.price_list_id = e.price_list_id AND r.line = e.line
 WHERE e.price_list_id = $1 AND (e.line, e.id) > ($2, $3::bigint)
 ORDER BY e.line, e.id
 LIMIT $4`;

/** The next `limit` reasons after (line, id), in file order, with what the line held. */
export function errorLinesAfter(ex: Executor, listId: string, after: readonly [number, string], limit: number): Promise<ErrorLine[]> {
  return queryRows(ex, errorLineSchema, ERROR_LINES_SQL, [listId, after[0], after[1], limit]);
}

const flaggedMoveSchema = z.object({
  part_number: z.string(),
  brand: z.string(),
  old_cost_cents: z.number().int(),
  cost_cents: z.number().int(),
  old_list_cents: z.number().int(),
  list_cents: z.number().int(),
  cost_change_pct: z.number().nullable(),
  list_change_pct: z.number().nullable(),
});
export type FlaggedMove = z.infer<typeof flaggedMoveSchema>;

/** The largest flagged price moves of a list, largest first. */
export function largestFlaggedMoves(ex: Executor, listId: string, limit: number): Promise<FlaggedMove[]> {
  return queryRows(
    ex,
    flaggedMoveSchema,
    `SELECT part_number, brand, old_cost_cents, cost_cents, old_list_cents, list_cents, cost_change_pct, list_change_pct
       FROM price_list_row WHERE price_list_id = $1 AND flagged ORDER BY greatest(abs(cost_change_pct), abs(list_change_pct)) DESC, line LIMIT $2`,
    [listId, limit],
  );
}

/**
 * Parts of our own brands whose search documents a commit changed — the new ones and both ends of
 * each link — up to `limit` of them. Prices are not in the documents.
 */
export function touchedOwnPartIds(ex: Executor, listId: string, limit: number): Promise<string[]> {
  return queryIds(
    ex,
    `SELECT p.id FROM price_list_row r JOIN brand b ON b.id = r.brand_id AND b.ours
       JOIN part p ON p.brand_id = r.brand_id AND p.part_number_norm = r.part_number_norm
      WHERE r.price_list_id = $1 AND (r.change = 'new' OR r.supersession = 'link')
     UNION
     SELECT old.id FROM price_list_row r JOIN brand b ON b.id = r.brand_id AND b.ours
       JOIN part old ON old.brand_id = r.brand_id AND old.part_number_norm = r.supersedes_norm
      WHERE r.price_list_id = $1 AND r.supersession = 'link'
     LIMIT $2`,
    [listId, limit],
  );
}
