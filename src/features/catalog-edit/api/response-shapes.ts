import { z } from 'zod';
import { partSummarySchema } from '@shared/schemas/catalog';
import { coilSpecSchema, heatStepSchema, resolvedPlugSpecSchema } from '@shared/schemas/specs';

/** What the Catalog page reads of the brand and part answers; shared/ has no response schema for them yet. */

export const brandSchema = z.object({
  id: z.string(),
  name: z.string(),
  ours: z.boolean(),
  heatCodeNote: z.string().nullable(),
  heatCodes: z.array(z.object({ code: z.string(), heatStep: heatStepSchema })),
});
export type Brand = z.infer<typeof brandSchema>;

const partRefSchema = z.object({ id: z.string(), partNumber: z.string() });
export type PartRef = z.infer<typeof partRefSchema>;

const interchangeRowSchema = z.object({
  id: z.string(),
  brand: z.string(),
  number: z.string(),
  source: z.string(),
  confidence: z.number(),
  check: z
    .object({ verdict: z.enum(['go', 'review', 'no-go']), engine: z.string() })
    .nullable()
    .optional(),
});
export type InterchangeRow = z.infer<typeof interchangeRowSchema>;

/** GET /api/parts/:id, and the answer of POST /api/parts and PATCH /api/parts/:id. */
export const partDetailSchema = z.object({
  part: partSummarySchema,
  spec: z.union([coilSpecSchema, resolvedPlugSpecSchema]).nullable(),
  interchange: z.array(interchangeRowSchema),
  supersession: z.object({
    supersedes: z.array(partRefSchema),
    supersededBy: partRefSchema.nullable(),
    current: partRefSchema,
  }),
});
export type PartDetail = z.infer<typeof partDetailSchema>;
