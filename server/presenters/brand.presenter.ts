import type { Brand, BrandResponse, BrandsResponse } from '../../shared/schemas/brands';

export interface BrandRecord {
  id: string;
  name: string;
  ours: boolean;
  heat_code_note: string | null;
  /** Hottest first. */
  heat_codes: { code: string; heatStep: number }[];
}

export function presentBrand(b: BrandRecord): Brand {
  return {
    id: b.id,
    name: b.name,
    ours: b.ours,
    heatCodeNote: b.heat_code_note,
    heatCodes: b.heat_codes.map((h) => ({ code: h.code, heatStep: h.heatStep })),
  };
}

export const presentBrands = (rows: BrandRecord[]): BrandsResponse => ({ brands: rows.map(presentBrand) });
export const presentCreatedBrand = (row: BrandRecord): BrandResponse => ({ brand: presentBrand(row) });
