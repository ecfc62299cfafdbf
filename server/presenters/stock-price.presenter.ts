import { canSeeCost, type Role } from '../../shared/roles';
import type { Price, StockView } from '../../shared/schemas/parts';
import type { SellPriceBasis } from '../../shared/schemas/sell-price';
import type { PriceRow } from '../repositories/prices.repository';
import { inStockAnywhere, type PartStock } from '../repositories/stock.repository';

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

/** The row the store sells a part at, as the sell-price rule marked it (prices.repository.ts). */
export function sellPriceRow(rows: readonly PriceRow[]): PriceRow | undefined {
  return rows.find((r) => r.selling);
}

/** Which supplier's price the store sells at, and why. */
export function sellPriceBasis(rows: readonly PriceRow[]): SellPriceBasis | null {
  const row = sellPriceRow(rows);
  if (!row) return null;
  return {
    supplierId: row.supplierId,
    supplier: row.supplier,
    brand: row.brand,
    reason: row.preferred ? 'preferred-supplier' : 'lowest-list',
  };
}

/** The store's sell price for a part, as the role may see it. */
export function sellPrice(rows: readonly PriceRow[], role: Role): Price | null {
  const best = sellPriceRow(rows);
  return best ? presentPrice(best, role) : null;
}

/** A technician (a shop's login) sees in stock yes/no, not the stores' counts or bins. */
export function presentStock(stock: PartStock, role: Role): StockView {
  const inStock = inStockAnywhere(stock);
  if (role === 'technician') return { inStock };
  return { inStock, here: stock.here, elsewhere: stock.elsewhere };
}
