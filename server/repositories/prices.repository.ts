import { z } from 'zod';
import { queryRows, type Executor } from '../db/executor';

/** One supplier's price for a part. */
export interface PriceRow {
  supplierId: string;
  supplier: string;
  costCents: number;
  listCents: number;
  coreCents: number;
  packQty: number;
  effectiveDate: string;
}

const priceRowSchema = z.object({
  part_id: z.string(),
  supplier_id: z.string(),
  supplier: z.string(),
  cost_cents: z.number().int(),
  list_cents: z.number().int(),
  core_cents: z.number().int(),
  pack_qty: z.number().int(),
  effective_date: z.string(),
});

/** Every supplier's price of the given parts, by supplier name. */
export async function pricesOf(ex: Executor, partIds: readonly string[]): Promise<Map<string, PriceRow[]>> {
  const out = new Map<string, PriceRow[]>();
  if (!partIds.length) return out;
  const rows = await queryRows(
    ex,
    priceRowSchema,
    `SELECT sp.part_id, s.id AS supplier_id, s.name AS supplier, sp.cost_cents, sp.list_cents, sp.core_cents, sp.pack_qty,
            to_char(sp.effective_date, 'YYYY-MM-DD') AS effective_date
       FROM supplier_price sp JOIN supplier s ON s.id = sp.supplier_id WHERE sp.part_id = ANY($1::uuid[]) ORDER BY s.name`,
    [partIds],
  );
  for (const r of rows) {
    const list = out.get(r.part_id) ?? [];
    list.push({
      supplierId: r.supplier_id,
      supplier: r.supplier,
      costCents: r.cost_cents,
      listCents: r.list_cents,
      coreCents: r.core_cents,
      packQty: r.pack_qty,
      effectiveDate: r.effective_date,
    });
    out.set(r.part_id, list);
  }
  return out;
}
