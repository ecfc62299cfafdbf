import { z } from 'zod';
import { checkSchema, verdictSchema } from './compat';
import { partSummarySchema, priceSchema, stockViewSchema } from './parts';
import { locationQuerySchema } from './locations';
import { PART_KINDS } from './specs';

/** GET /api/engines/:id/alternates: our parts ranked against the engine's fitted coil or plug. */

export const alternatesQuerySchema = locationQuerySchema.extend({
  kind: z.enum(PART_KINDS),
  /** Include the no-go candidates too. */
  all: z.enum(['1', 'true', '0', 'false']).optional(),
});
export type AlternatesQuery = z.infer<typeof alternatesQuerySchema>;

export const alternateSchema = z
  .object({
    part: partSummarySchema,
    verdict: verdictSchema,
    /** How far from the original, for ranking within a verdict (lower is closer). */
    deviation: z.number(),
    checks: z.array(checkSchema),
    /** This store's count and bin, then the other stores' (the ranking prefers stock here among equals); yes/no for a technician. */
    stock: stockViewSchema,
    price: priceSchema.nullable(),
  })
  .meta({ id: 'Alternate' });
export type Alternate = z.infer<typeof alternateSchema>;

/** `original` is the engine's fitted part of that kind, null when none is on file. */
export const alternatesResponseSchema = z.object({ original: partSummarySchema.nullable(), alternates: z.array(alternateSchema) });
export type AlternatesResponse = z.infer<typeof alternatesResponseSchema>;
