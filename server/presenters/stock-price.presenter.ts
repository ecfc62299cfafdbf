import { canSeeCost, type Role } from '../../shared/roles';
import type { Price, StockView } from '../../shared/schemas/parts';
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

/** The row the store sells a part at: the lowest list price among its suppliers (then the lowest cost). */
export function sellPriceRow(rows: readonly PriceRow[]): PriceRow | undefined {
  return [...rows].sort((a, b) => a.listCents - b.listCents || a.costCents - b.costCents)[0];
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
