import { z } from 'zod';
import { isValidGtin } from '../gtin';
import { coilSpecSchema, heatStepSchema, PART_KINDS, plugSpecSchema } from './specs';

export const uuidSchema = z.string().uuid();
export const partStatusSchema = z.enum(['active', 'discontinued']);

export const gtinSchema = z
  .string()
  .trim()
  .regex(/^\d{8}$|^\d{12,14}$/, 'a GTIN has 8, 12, 13 or 14 digits')
  .refine(isValidGtin, 'the GTIN check digit is wrong');

export const printedNumberSchema = z.string().trim().min(1).max(60);

export const createBrandBodySchema = z.object({
  name: z.string().trim().min(1).max(80),
  ours: z.boolean().default(false),
  heatCodeNote: z.string().trim().max(200).nullable().optional(),
  heatCodes: z
    .array(z.object({ code: z.string().trim().min(1).max(20), heatStep: heatStepSchema }))
    .max(40)
    .default([])
    .refine((rows) => new Set(rows.map((r) => r.code)).size === rows.length, 'each heat code once'),
});
export type CreateBrandBody = z.infer<typeof createBrandBodySchema>;

export const createPartBodySchema = z
  .object({
    brand: z.string().trim().min(1).max(80),
    partNumber: printedNumberSchema,
    kind: z.enum(PART_KINDS),
    description: z.string().trim().max(500).default(''),
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
    description: z.string().trim().max(500).optional(),
    status: partStatusSchema.optional(),
    supersededById: uuidSchema.nullable().optional(),
    gtin: gtinSchema.nullable().optional(),
    coil: coilSpecSchema.optional(),
    plug: plugSpecSchema.optional(),
  })
  .refine((b) => Object.keys(b).length > 0, 'nothing to change');
export type UpdatePartBody = z.infer<typeof updatePartBodySchema>;

export const createInterchangeBodySchema = z.object({
  brand: z.string().trim().min(1).max(80),
  number: printedNumberSchema,
  partId: uuidSchema,
  source: z.string().trim().min(1).max(60).default('manual'),
  confidence: z.number().min(0).max(1).default(1),
});
export type CreateInterchangeBody = z.infer<typeof createInterchangeBodySchema>;

export const vehicleQuerySchemas = {
  makes: z.object({ year: z.coerce.number().int().min(1900).max(2100) }),
  models: z.object({ year: z.coerce.number().int().min(1900).max(2100), make: z.string().min(1).max(80) }),
  engines: z.object({
    year: z.coerce.number().int().min(1900).max(2100),
    make: z.string().min(1).max(80),
    model: z.string().min(1).max(80),
  }),
};

/** Money a clerk may see: the sell price. Cost and margin are added only for buyers and admins. */
export const priceSchema = z.object({
  supplierId: z.string(),
  supplier: z.string(),
  listCents: z.number().int(),
  coreCents: z.number().int(),
  packQty: z.number().int(),
  effectiveDate: z.string(),
  costCents: z.number().int().optional(),
  marginPct: z.number().optional(),
});
export type Price = z.infer<typeof priceSchema>;

export const stockSchema = z.object({ onHand: z.number().int(), bin: z.string(), inStock: z.boolean() });
export type Stock = z.infer<typeof stockSchema>;

export const partSummarySchema = z.object({
  id: z.string(),
  brand: z.string(),
  ours: z.boolean(),
  partNumber: z.string(),
  kind: z.enum(PART_KINDS),
  description: z.string(),
  gtin: z.string().nullable(),
  status: partStatusSchema,
  supersededById: z.string().nullable(),
  hasSpec: z.boolean(),
});
export type PartSummary = z.infer<typeof partSummarySchema>;
