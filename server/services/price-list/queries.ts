import type { DataSource } from 'typeorm';
import type { PriceListChangesQuery, PriceListErrorsQuery, PriceListHistoryQuery } from '../../../shared/schemas/price-lists';
import { AppError } from '../../errors';
import { listChangeRows, listRowErrorRows, type ChangeRow, type RowErrorRow } from '../../repositories/price-list-rows.repository';
import { findPriceList, listPriceListRows, priceListExists, type PriceListRow } from '../../repositories/price-lists.repository';

export async function getPriceList(ds: DataSource, id: string): Promise<PriceListRow> {
  const row = await findPriceList(ds.manager, id);
  if (!row) throw AppError.notFound('Price list');
  return row;
}

/** The history: newest first, of one supplier or of all. */
export function listPriceLists(ds: DataSource, q: PriceListHistoryQuery): Promise<{ rows: PriceListRow[]; total: number }> {
  return listPriceListRows(ds.manager, q);
}

async function ensureList(ds: DataSource, id: string): Promise<void> {
  if (!(await priceListExists(ds.manager, id))) throw AppError.notFound('Price list');
}

/** Rows of the preview tables, in file order. */
export async function listChanges(ds: DataSource, id: string, q: PriceListChangesQuery): Promise<{ rows: ChangeRow[]; total: number }> {
  await ensureList(ds, id);
  return listChangeRows(ds.manager, id, q);
}

export async function listRowErrors(ds: DataSource, id: string, q: PriceListErrorsQuery): Promise<{ rows: RowErrorRow[]; total: number }> {
  await ensureList(ds, id);
  return listRowErrorRows(ds.manager, id, q);
}
