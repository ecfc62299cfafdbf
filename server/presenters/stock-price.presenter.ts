import { canSeeCost, type Role } from '../../shared/roles';
import type { Price, Stock } from '../../shared/schemas/catalog';

export interface PriceRow {
  supplierId: string;
  supplier: string;
  costCents: number;
  listCents: number;
  coreCents: number;
  packQty: number;
  effectiveDate: string;
}

/** Margin on the sell (list) price, in percent with one decimal. */
export function marginPct(costCents: number, listCents: number): number {
  return listCents > 0 ? Math.round(((listCents - costCents) / listCents) * 1000) / 10 : 0;
}

/** Cost and margin only for buyers and admins: for anyone else the keys are absent, not blanked. */
export function presentPrice(row: PriceRow, role: Role): Price {
  const base: Price = {
    supplierId: row.supplierId,
    supplier: row.supplier,
    listCents: row.listCents,
    coreCents: row.coreCents,
    packQty: row.packQty,
    effectiveDate: row.effectiveDate,
  };
  if (!canSeeCost(role)) return base;
  return { ...base, costCents: row.costCents, marginPct: marginPct(row.costCents, row.listCents) };
}

/** The store's sell price for a part: the lowest list price among its suppliers. */
export function sellPrice(rows: PriceRow[], role: Role): Price | null {
  const best = [...rows].sort((a, b) => a.listCents - b.listCents || a.costCents - b.costCents)[0];
  return best ? presentPrice(best, role) : null;
}

/** A technician (a shop's login) sees in stock yes/no, not the store's count or bin. */
export function presentStock(onHand: number, bin: string, role: Role): Stock | { inStock: boolean } {
  if (role === 'technician') return { inStock: onHand > 0 };
  return { onHand, bin, inStock: onHand > 0 };
}
