import { z } from 'zod';
import { execute, queryOne, queryRows, type Executor } from '../db/executor';

const ruleRowSchema = z.object({
  brand_id: z.string(),
  brand: z.string(),
  supplier_id: z.string().nullable(),
  supplier: z.string().nullable(),
  updated_at: z.date().nullable(),
});
export type SellPriceRuleRow = z.infer<typeof ruleRowSchema>;

const RULE_SELECT = `
SELECT b.id AS brand_id, b.name AS brand, r.supplier_id, s.name AS supplier, r.updated_at
  FROM brand b LEFT JOIN sell_price_rule r ON r.brand_id = b.id LEFT JOIN supplier s ON s.id = r.supplier_id`;

/** Every brand a supplier prices (or that has a rule), with its preferred supplier or none. */
export function listSellPriceRules(ex: Executor): Promise<SellPriceRuleRow[]> {
  return queryRows(
    ex,
    ruleRowSchema,
    `${RULE_SELECT}
      WHERE r.brand_id IS NOT NULL
         OR EXISTS (SELECT 1 FROM part p JOIN supplier_price sp ON sp.part_id = p.id WHERE p.brand_id = b.id)
      ORDER BY b.ours DESC, b.name`,
  );
}

export function findSellPriceRule(ex: Executor, brandId: string): Promise<SellPriceRuleRow | null> {
  return queryOne(ex, ruleRowSchema, `${RULE_SELECT} WHERE b.id = $1`, [brandId]);
}

export function setPreferredSupplier(ex: Executor, brandId: string, supplierId: string, actorId: string): Promise<number> {
  return execute(
    ex,
    `INSERT INTO sell_price_rule (brand_id, supplier_id, updated_by, updated_at) VALUES ($1, $2, $3, now())
     ON CONFLICT (brand_id) DO UPDATE SET supplier_id = EXCLUDED.supplier_id, updated_by = EXCLUDED.updated_by, updated_at = now()`,
    [brandId, supplierId, actorId],
  );
}

/** Back to the default: the lowest list price. */
export function clearPreferredSupplier(ex: Executor, brandId: string): Promise<number> {
  return execute(ex, `DELETE FROM sell_price_rule WHERE brand_id = $1`, [brandId]);
}
