import type { DataSource } from 'typeorm';
import { AppError } from '../../errors';
import type { BrandRecord } from '../../presenters/brand.presenter';

const BRAND_SELECT = `
SELECT b.id, b.name, b.ours, b.heat_code_note,
       coalesce(json_agg(json_build_object('code', h.code, 'heatStep', h.heat_step) ORDER BY h.heat_step) FILTER (WHERE h.code IS NOT NULL), '[]') AS heat_codes
  FROM brand b LEFT JOIN brand_heat_code h ON h.brand_id = b.id`;

/** Every brand with its heat table, our own lines first. */
export async function listBrands(ds: DataSource): Promise<BrandRecord[]> {
  return (await ds.query(`${BRAND_SELECT} GROUP BY b.id ORDER BY b.ours DESC, b.name`)) as BrandRecord[];
}

export async function getBrand(ds: DataSource, id: string): Promise<BrandRecord> {
  const rows = (await ds.query(`${BRAND_SELECT} WHERE b.id = $1 GROUP BY b.id`, [id])) as BrandRecord[];
  if (!rows[0]) throw AppError.notFound('Brand');
  return rows[0];
}
