import { z } from 'zod';
import { queryOne, queryRows, type Executor } from '../db/executor';

/** One supplier's price for a part, and whether the sell-price rule picks it. */
export interface PriceRow {
  supplierId: string;
  supplier: string;
  costCents: number;
  listCents: number;
  coreCents: number;
  packQty: number;
  effectiveDate: string;
  /** The row the store sells the part at (one per part). */
  selling: boolean;
  /** This supplier is the preferred one for the part's brand. */
  preferred: boolean;
  brand: string;
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
  preferred: z.boolean(),
  selling: z.boolean(),
  brand: z.string(),
});

/**
 * The sell-price rule, written once in SQL over `supplier_price sp`, `supplier s`, `part p` and
 * `sell_price_rule spr` (left-joined on the part's brand): the brand's preferred supplier first,
 * then the lowest list price, the lowest cost, the supplier's name. Archived suppliers sell nothing.
 */
const RULE_FROM = `FROM supplier_price sp
  JOIN supplier s ON s.id = sp.supplier_id AND s.archived_at IS NULL
  JOIN part p ON p.id = sp.part_id
  JOIN brand b ON b.id = p.brand_id
  LEFT JOIN sell_price_rule spr ON spr.brand_id = p.brand_id`;
const PREFERRED = `coalesce(spr.supplier_id = sp.supplier_id, false)`;
const SELL_RANK = `row_number() OVER (PARTITION BY sp.part_id ORDER BY ${PREFERRED} DESC, sp.list_cents, sp.cost_cents, s.name)`;

/** Every active supplier's price of the given parts, by supplier name, the one the store sells at marked. */
export async function pricesOf(ex: Executor, partIds: readonly string[]): Promise<Map<string, PriceRow[]>> {
  const out = new Map<string, PriceRow[]>();
  if (!partIds.length) return out;
  const rows = await queryRows(
    ex,
    priceRowSchema,
    `SELECT sp.part_id, s.id AS supplier_id, s.name AS supplier, sp.cost_cents, sp.list_cents, sp.core_cents, sp.pack_qty,
            to_char(sp.effective_date, 'YYYY-MM-DD') AS effective_date, b.name AS brand,
            ${PREFERRED} AS preferred, ${SELL_RANK} = 1 AS selling
       ${RULE_FROM} WHERE sp.part_id = ANY($1::uuid[]) ORDER BY s.name`,
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
      selling: r.selling,
      preferred: r.preferred,
      brand: r.brand,
    });
    out.set(r.part_id, list);
  }
  return out;
}

const counterPricesRowSchema = z.object({ parts_priced: z.number().int(), selling_here: z.number().int() });

/** Of the parts whose price this list wrote for its supplier, how many the rule sells at that supplier's price. */
export async function counterPricesOfList(
  ex: Executor,
  listId: string,
  supplierId: string,
): Promise<{ partsPriced: number; sellingHere: number }> {
  const row = await queryOne(
    ex,
    counterPricesRowSchema,
    `WITH listed AS (SELECT part_id FROM supplier_price WHERE supplier_id = $2 AND price_list_id = $1),
          ranked AS (SELECT sp.part_id, sp.supplier_id, ${SELL_RANK} AS rank ${RULE_FROM}
                      WHERE sp.part_id IN (SELECT part_id FROM listed))
     SELECT (SELECT count(*) FROM listed)::int AS parts_priced,
            (SELECT count(*) FROM ranked WHERE rank = 1 AND supplier_id = $2)::int AS selling_here`,
    [listId, supplierId],
  );
  return { partsPriced: row?.parts_priced ?? 0, sellingHere: row?.selling_here ?? 0 };
}
