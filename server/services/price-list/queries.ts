import type { DataSource } from 'typeorm';
import type { PriceListChangesQuery, PriceListErrorsQuery, PriceListHistoryQuery } from '../../../shared/schemas/price-lists';
import { AppError } from '../../errors';
import type { ChangeRecord, PriceListRecord, RowErrorRecord } from '../../presenters/price-list.presenter';

/** A price list with its supplier's name and its people's names. */
const PRICE_LIST_SELECT = `
SELECT pl.id, pl.supplier_id, s.name AS supplier_name, pl.file_name, pl.sha256, pl.size_bytes, pl.encoding, pl.delimiter,
       pl.columns, pl.mapping, pl.mapping_source, pl.status, pl.stale, pl.counts, pl.flagged, pl.flag_threshold_pct,
       pl.progress, pl.applied, pl.created_by, cu.name AS created_by_name, pl.created_at,
       pl.committed_by, mu.name AS committed_by_name, pl.committed_at, pl.discarded_at
  FROM price_list pl
  JOIN supplier s ON s.id = pl.supplier_id
  LEFT JOIN "user" cu ON cu.id = pl.created_by
  LEFT JOIN "user" mu ON mu.id = pl.committed_by`;

export async function getPriceList(ds: DataSource, id: string): Promise<PriceListRecord> {
  const rows = (await ds.query(`${PRICE_LIST_SELECT} WHERE pl.id = $1`, [id])) as PriceListRecord[];
  if (!rows[0]) throw AppError.notFound('Price list');
  return rows[0];
}

/** The history: newest first, of one supplier or of all. */
export async function listPriceLists(ds: DataSource, q: PriceListHistoryQuery): Promise<{ rows: PriceListRecord[]; total: number }> {
  const where = q.supplierId ? `WHERE pl.supplier_id = $1` : '';
  const params = q.supplierId ? [q.supplierId] : [];
  // limit and offset are integers checked by the query schema.
  const rows = (await ds.query(
    `${PRICE_LIST_SELECT} ${where} ORDER BY pl.created_at DESC, pl.id LIMIT ${q.limit} OFFSET ${q.offset}`,
    params,
  )) as PriceListRecord[];
  const total = (await ds.query(`SELECT count(*)::int AS n FROM price_list pl ${where}`, params)) as { n: number }[];
  return { rows, total: total[0]?.n ?? 0 };
}

async function ensureList(ds: DataSource, id: string): Promise<void> {
  const rows = (await ds.query(`SELECT 1 FROM price_list WHERE id = $1`, [id])) as unknown[];
  if (!rows.length) throw AppError.notFound('Price list');
}

const CHANGE_COLUMNS = `line, change, part_id, part_number, brand, description, kind, part_kind, old_cost_cents, cost_cents,
  old_list_cents, list_cents, old_core_cents, core_cents, old_pack_qty, pack_qty, cost_change_pct, list_change_pct, flagged,
  (coil IS NOT NULL OR plug IS NOT NULL) AS has_spec, supersedes, supersession`;

/** Rows of the preview tables, in file order. */
export async function listChanges(ds: DataSource, id: string, q: PriceListChangesQuery): Promise<{ rows: ChangeRecord[]; total: number }> {
  await ensureList(ds, id);
  const conditions = [`price_list_id = $1`, `NOT retracted`, `change IN ('new', 'changed', 'unchanged')`];
  const params: unknown[] = [id];
  if (q.type === 'supersession') conditions.push(`supersedes_norm IS NOT NULL`);
  else if (q.type) {
    params.push(q.type);
    conditions.push(`change = $${params.length}`);
  }
  if (q.flagged) conditions.push(q.flagged === 'true' ? `flagged` : `NOT flagged`);
  const where = conditions.join(' AND ');
  const rows = (await ds.query(
    `SELECT ${CHANGE_COLUMNS} FROM price_list_row WHERE ${where} ORDER BY line LIMIT ${q.limit} OFFSET ${q.offset}`,
    params,
  )) as ChangeRecord[];
  const total = (await ds.query(`SELECT count(*)::int AS n FROM price_list_row WHERE ${where}`, params)) as { n: number }[];
  return { rows, total: total[0]?.n ?? 0 };
}

export async function listRowErrors(
  ds: DataSource,
  id: string,
  q: PriceListErrorsQuery,
): Promise<{ rows: RowErrorRecord[]; total: number }> {
  await ensureList(ds, id);
  const rows = (await ds.query(
    `SELECT line, "column", field, message FROM price_list_row_error WHERE price_list_id = $1 ORDER BY line, id LIMIT $2 OFFSET $3`,
    [id, q.limit, q.offset],
  )) as RowErrorRecord[];
  const total = (await ds.query(`SELECT count(*)::int AS n FROM price_list_row_error WHERE price_list_id = $1`, [id])) as { n: number }[];
  return { rows, total: total[0]?.n ?? 0 };
}
