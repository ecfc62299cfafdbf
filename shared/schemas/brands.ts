import { z } from 'zod';
import { uuidSchema } from './common';
import { heatCodeSchema, heatStepSchema } from './specs';
import { text } from './text';

/** Brands: ours and the others whose numbers the counter is asked for, each with its heat-code table. */

export const brandNameSchema = text({ min: 1, max: 80 });

const heatCodeRowSchema = z.object({ code: heatCodeSchema, heatStep: heatStepSchema });

// ---------- requests ----------

export const createBrandBodySchema = z.object({
  name: brandNameSchema,
  ours: z.boolean().default(false),
  heatCodeNote: text({ max: 200 }).nullable().optional(),
  heatCodes: z
    .array(heatCodeRowSchema)
    .max(40)
    .default([])
    .refine((rows) => new Set(rows.map((r) => r.code)).size === rows.length, 'each heat code once'),
});
export type CreateBrandBody = z.infer<typeof createBrandBodySchema>;

// ---------- responses ----------

export const brandSchema = z
  .object({
    id: uuidSchema,
    name: z.string(),
    ours: z.boolean(),
    heatCodeNote: z.string().nullable(),
    /** Hottest first. */
    heatCodes: z.array(z.object({ code: z.string(), heatStep: heatStepSchema })),
  })
  .meta({ id: 'Brand' });
export type Brand = z.infer<typeof brandSchema>;

export const brandsResponseSchema = z.object({ brands: z.array(brandSchema) });
export type BrandsResponse = z.infer<typeof brandsResponseSchema>;

export const brandResponseSchema = z.object({ brand: brandSchema });
export type BrandResponse = z.infer<typeof brandResponseSchema>;
