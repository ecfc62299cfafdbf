import { z } from 'zod';
import { brandNameSchema } from './brands';
import { printedNumberSchema, uuidSchema } from './common';
import { text } from './text';

/** Interchange: another brand's number claimed equivalent to one of our parts. */

export const createInterchangeBodySchema = z.object({
  brand: brandNameSchema,
  number: printedNumberSchema,
  partId: uuidSchema,
  source: text({ min: 1, max: 60 }).default('manual'),
  confidence: z.number().min(0).max(1).default(1),
});
export type CreateInterchangeBody = z.infer<typeof createInterchangeBodySchema>;

/** One claim as stored. */
export const interchangeClaimSchema = z
  .object({
    id: uuidSchema,
    partId: uuidSchema,
    brand: z.string(),
    number: z.string(),
    source: z.string(),
    confidence: z.number(),
  })
  .meta({ id: 'InterchangeClaim' });
export type InterchangeClaim = z.infer<typeof interchangeClaimSchema>;

export const interchangeResponseSchema = z.object({ interchange: interchangeClaimSchema });
export type InterchangeResponse = z.infer<typeof interchangeResponseSchema>;
