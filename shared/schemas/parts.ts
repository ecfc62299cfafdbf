import { z } from 'zod';
import { isValidGtin } from '../gtin';
import { printedNumberSchema, uuidSchema } from './common';
import { interchangeCheckSchema } from './compat';
import { interchangeClaimSchema } from './interchange';
import { chainStockSchema, locationQuerySchema } from './locations';
import { brandNameSchema } from './brands';
import { sellPriceBasisSchema } from './sell-price';
import { coilSpecSchema, PART_KINDS, partSpecSchema, plugSpecSchema } from './specs';
import { text } from './text';

/** Parts: the catalog's coils and plugs, ours and other brands'. */

export const partStatusSchema = z.enum(['active', 'discontinued']);

export const gtinSchema = z
  .string()
  .trim()
  .regex(/^\d{8}$|^\d{12,14}$/, 'a GTIN has 8, 12, 13 or 14 digits')
  .refine(isValidGtin, 'the GTIN check digit is wrong');

const descriptionSchema = text({ max: 500 });

// ---------- requests ----------

export const createPartBodySchema = z
  .object({
    brand: brandNameSchema,
    partNumber: printedNumberSchema,
    kind: z.enum(PART_KINDS),
    description: descriptionSchema.default(''),
    gtin: gtinSchema.nullable().optional(),
    coil: coilSpecSchema.optional(),
    plug: plugSpecSchema.optional(),
  })
  .superRefine((b, ctx) => {
    if (b.kind === 'coil' && b.plug) ctx.addIssue({ code: 'custom', path: ['plug'], message: 'a coil takes a coil spec' });
    if (b.kind === 'plug' && b.coil) ctx.addIssue({ code: 'custom', path: ['coil'], message: 'a plug takes a plug spec' });
  });
export type CreatePartBody = z.infer<typeof createPartBodySchema>;

export const updatePartBodySchema = z
  .object({
    description: descriptionSchema.optional(),
    status: partStatusSchema.optional(),
    supersededById: uuidSchema.nullable().optional(),
    gtin: gtinSchema.nullable().optional(),
    coil: coilSpecSchema.optional(),
    plug: plugSpecSchema.optional(),
  })
  .refine((b) => Object.keys(b).length > 0, 'nothing to change');
export type UpdatePartBody = z.infer<typeof updatePartBodySchema>;

/** GET /api/parts/:id?engineId=: with an engine, each interchange claim is judged on it. */
export const partQuerySchema = locationQuerySchema.extend({ engineId: uuidSchema.optional() });

// ---------- responses ----------

/** Money a clerk may see: the sell price. Cost and margin are added only for buyers and admins. */
export const priceSchema = z
  .object({
    supplierId: uuidSchema,
    supplier: z.string(),
    listCents: z.number().int(),
    coreCents: z.number().int(),
    packQty: z.number().int(),
    /** YYYY-MM-DD */
    effectiveDate: z.string(),
    costCents: z.number().int().optional(),
    marginPct: z.number().optional(),
  })
  .meta({ id: 'Price' });
export type Price = z.infer<typeof priceSchema>;

/**
 * Clerks, buyers and admins get this store's count and bin and the other stores' counts; a
 * technician (a shop's login) only in stock yes/no (at any store of the chain).
 */
export const stockViewSchema = z.union([chainStockSchema, z.object({ inStock: z.boolean() })]);
export type StockView = z.infer<typeof stockViewSchema>;

export const partSummarySchema = z
  .object({
    id: uuidSchema,
    brand: z.string(),
    ours: z.boolean(),
    partNumber: z.string(),
    kind: z.enum(PART_KINDS),
    description: z.string(),
    gtin: z.string().nullable(),
    status: partStatusSchema,
    supersededById: uuidSchema.nullable(),
    hasSpec: z.boolean(),
  })
  .meta({ id: 'PartSummary' });
export type PartSummary = z.infer<typeof partSummarySchema>;

export const partRefSchema = z.object({ id: uuidSchema, partNumber: z.string() });
export type PartRef = z.infer<typeof partRefSchema>;

/** The whole supersession chain through a part: what it replaced, what replaced it, and the current part. */
export const supersessionSchema = z.object({
  supersedes: z.array(partRefSchema),
  supersededBy: partRefSchema.nullable(),
  current: partRefSchema,
});
export type Supersession = z.infer<typeof supersessionSchema>;

/** A claim on the part's page, judged: `check` is null when there is nothing to judge from. */
export const interchangeRowSchema = interchangeClaimSchema.omit({ partId: true }).extend({
  /** The foreign part in our catalog, when we hold its spec: what Compare judges against. */
  originalPartId: uuidSchema.nullable(),
  check: interchangeCheckSchema.nullable(),
});
export type InterchangeRow = z.infer<typeof interchangeRowSchema>;

/** GET /api/parts/:id, and the answer of POST /api/parts and PATCH /api/parts/:id. */
export const partDetailSchema = z
  .object({
    part: partSummarySchema,
    spec: partSpecSchema.nullable(),
    interchange: z.array(interchangeRowSchema),
    supersession: supersessionSchema,
    stock: stockViewSchema,
    /** The sell price, chosen by the sell-price rule (see sell-price.ts). */
    price: priceSchema.nullable(),
    /** Which supplier's price `price` is, and why; null when no supplier prices the part. */
    sellPriceBasis: sellPriceBasisSchema.nullable(),
    /** One per supplier; cost and margin only for buyers and admins. */
    prices: z.array(priceSchema),
  })
  .meta({ id: 'PartDetail' });
export type PartDetail = z.infer<typeof partDetailSchema>;
