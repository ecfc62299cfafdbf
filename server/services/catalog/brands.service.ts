import type { DataSource } from 'typeorm';
import type { Executor } from '../../db/executor';
import { AppError } from '../../errors';
import { findBrandRow, listBrandRows, type BrandRow } from '../../repositories/brands.repository';

/** Every brand with its heat table, our own lines first. */
export function listBrands(ds: DataSource): Promise<BrandRow[]> {
  return listBrandRows(ds.manager);
}

export async function getBrand(ex: Executor, id: string): Promise<BrandRow> {
  const row = await findBrandRow(ex, id);
  if (!row) throw AppError.notFound('Brand');
  return row;
}
