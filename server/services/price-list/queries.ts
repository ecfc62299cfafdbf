import type { DataSource } from 'typeorm';
import type {
  PriceList,
  PriceListChanges,
  PriceListChangesQuery,
  PriceListErrors,
  PriceListErrorsQuery,
  PriceListHistory,
  PriceListHistoryQuery,
} from '../../../shared/schemas/price-list';
import { AppError } from '../../errors';
import {
  PRICE_LIST_SELECT,
  presentChange,
  presentPriceList,
  presentRowError,
  type ChangeRecord,
  type PriceListRecord,
  type RowErrorRecord,
} from './present';

export async function getPriceList(ds: DataSource, id: string): Promise<PriceList> {
  const rows = (await ds.query(`${PRICE_LIST_SELECT} WHERE pl.id = $1`, [id])) as PriceListRecord[];
  if (!rows[0]) throw AppError.notFound('Price list');
  return presentPriceList(rows[0]);
}

/** The history: newest first, of one supplier or of all. */
export async function listPriceLists(ds: DataSource, q: PriceListHistoryQuery): Promise<PriceListHistory> {
  const where = q.supplierId ? `WHERE pl.supplier_id = $1` : '';
  const params = q.supplierId ? [q.supplierId] : [];
  // limit and offset are integers checked by the query schema.
  const rows = (await ds.query(
    `${PRICE_LIST_SELECT} ${where} ORDER BY pl.created_at DESC, pl.id LIMIT ${q.limit} OFFSET ${q.offset}`,
    params,
  )) as PriceListRecord[];
  const total = (await ds.query(`SELECT count(*)::int AS n FROM price_list pl ${where}`, params)) as { n: number }[];
  return { priceLists: rows.map(presentPriceList), total: total[0]?.n ?? 0 };
}

async function ensureList(ds: DataSource, id: string): Promise<void> {
  const rows = (await ds.query(`SELECT 1 FROM price_list WHERE id = $1`, [id])) as unknown[];
  if (!rows.length) throw AppError.notFound('Price list');
}

const CHANGE_COLUMNS = `line, change, part_id, part_number, brand, description, kind, part_kind, old_cost_cents, cost_cents,
  old_list_cents, list_cents, old_core_cents, core_cents, old_pack_qty, pack_qty, cost_change_pct, list_change_pct, flagged,
  (coil IS NOT NULL OR plug IS NOT NULL) AS has_spec, supersedes, supersession`;

/** Rows of the preview tables, in file order. */
export async function listChanges(ds: DataSource, id: string, q: PriceListChangesQuery): Promise<PriceListChanges> {
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
  return { changes: rows.map(presentChange), total: total[0]?.n ?? 0 };
}

export async function listRowErrors(ds: DataSource, id: string, q: PriceListErrorsQuery): Promise<PriceListErrors> {
  await ensureList(ds, id);
  const rows = (await ds.query(
    `SELECT line, "column", field, message FROM price_list_row_error WHERE price_list_id = $1 ORDER BY line, id LIMIT $2 OFFSET $3`,
    [id, q.limit, q.offset],
  )) as RowErrorRecord[];
  const total = (await ds.query(`SELECT count(*)::int AS n FROM price_list_row_error WHERE price_list_id = $1`, [id])) as { n: number }[];
  return { errors: rows.map(presentRowError), total: total[0]?.n ?? 0 };
}
