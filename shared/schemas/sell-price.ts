import { z } from 'zod';
import { timestampSchema, uuidSchema } from './common';

/**
 * The sell-price rule: which supplier's list price the Counter sells a part at. Per brand the
 * buyer may name a preferred supplier; without one (the default), or when the preferred supplier
 * has no price for the part, the lowest list price wins (then the lowest cost).
 */

export const SELL_PRICE_REASONS = ['preferred-supplier', 'lowest-list'] as const;
export type SellPriceReason = (typeof SELL_PRICE_REASONS)[number];

/** Which supplier's price the store sells a part at, and why. */
export const sellPriceBasisSchema = z
  .object({
    supplierId: uuidSchema,
    supplier: z.string(),
    reason: z.enum(SELL_PRICE_REASONS),
    brand: z.string(),
  })
  .meta({ id: 'SellPriceBasis' });
export type SellPriceBasis = z.infer<typeof sellPriceBasisSchema>;

/** "Brackwater's price — preferred supplier for Sparrow" / "… — lowest list price". */
export function sellPriceReasonText(b: Pick<SellPriceBasis, 'reason' | 'brand'>): string {
  return b.reason === 'preferred-supplier' ? `preferred supplier for ${b.brand}` : 'lowest list price';
}

// ---------- requests ----------

/** PUT /api/sell-price-rules/:id: a preferred supplier, or null for the lowest list price. */
export const setSellPriceRuleBodySchema = z.object({ supplierId: uuidSchema.nullable() });
export type SetSellPriceRuleBody = z.infer<typeof setSellPriceRuleBodySchema>;

// ---------- responses ----------

/** One brand's rule: `supplierId` null means the lowest list price. */
export const sellPriceRuleSchema = z
  .object({
    brandId: uuidSchema,
    brand: z.string(),
    supplierId: uuidSchema.nullable(),
    supplier: z.string().nullable(),
    updatedAt: timestampSchema.nullable(),
  })
  .meta({ id: 'SellPriceRule' });
export type SellPriceRule = z.infer<typeof sellPriceRuleSchema>;

export const sellPriceRulesResponseSchema = z.object({ rules: z.array(sellPriceRuleSchema) });
export type SellPriceRulesResponse = z.infer<typeof sellPriceRulesResponseSchema>;

export const sellPriceRuleResponseSchema = z.object({ rule: sellPriceRuleSchema });
export type SellPriceRuleResponse = z.infer<typeof sellPriceRuleResponseSchema>;

/**
 * After a commit: of the parts this list priced, how many the Counter now sells at this
 * supplier's price (the rule picks it); the others sell at another supplier's price.
 */
export const counterPricesSchema = z.object({ partsPriced: z.number().int(), sellingHere: z.number().int() });
export type CounterPrices = z.infer<typeof counterPricesSchema>;

/** The commit's message about the Counter, true to the rule. */
export function counterPricesMessage(c: CounterPrices): string {
  if (c.partsPriced === 0) return 'No prices were written, so the Counter is unchanged.';
  if (c.sellingHere === c.partsPriced) return `The Counter now sells all ${c.partsPriced} parts of this list at this supplier's price.`;
  if (c.sellingHere === 0)
    return `The Counter's prices did not change: by the sell-price rule, all ${c.partsPriced} parts of this list sell at another supplier's price.`;
  const other = c.partsPriced - c.sellingHere;
  return `The Counter now sells ${c.sellingHere} of the ${c.partsPriced} parts of this list at this supplier's price; by the sell-price rule, the other ${other} sell at another supplier's price.`;
}
