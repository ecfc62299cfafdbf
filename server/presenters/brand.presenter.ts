import type { Brand, BrandResponse, BrandsResponse } from '../../shared/schemas/brands';
import type { BrandRow } from '../repositories/brands.repository';

export function presentBrand(b: BrandRow): Brand {
  return {
    id: b.id,
    name: b.name,
    ours: b.ours,
    heatCodeNote: b.heat_code_note,
    heatCodes: b.heat_codes.map((h) => ({ code: h.code, heatStep: h.heatStep })),
  };
}

export const presentBrands = (rows: BrandRow[]): BrandsResponse => ({ brands: rows.map(presentBrand) });
export const presentCreatedBrand = (row: BrandRow): BrandResponse => ({ brand: presentBrand(row) });
