import { z } from 'zod';

export const ERROR_CODES = [
  'bad_request',
  'validation_failed',
  'unauthorized',
  'forbidden',
  'csrf_invalid',
  'not_found',
  'conflict',
  'rate_limited',
  'payload_too_large',
  'unsupported_file',
  'unavailable',
  'search_unavailable',
  'internal',
] as const;
export type ErrorCode = (typeof ERROR_CODES)[number];

/** One problem with one field of a request: `field` is its dotted path ("substitute.spec.reachMm"). */
export const fieldIssueSchema = z.object({ field: z.string(), message: z.string() }).meta({ id: 'FieldIssue' });
export type FieldIssue = z.infer<typeof fieldIssueSchema>;

/** The `details` of a 400 that names fields. */
export const fieldIssuesSchema = z.array(fieldIssueSchema);

/** The `details` of a 409 from a unique index: which one, so a form can place the message. */
export const conflictDetailsSchema = z.object({ constraint: z.string() });

/**
 * The one error shape of the API: `{ error: { code, message, details? } }`. `details` is the list
 * of field issues on a 400 that names fields, the unique constraint on a 409, or what a refused
 * price-list file was refused for (shared/schemas/price-lists.ts).
 */
export const errorBodySchema = z
  .object({
    error: z.object({
      code: z.enum(ERROR_CODES),
      message: z.string(),
      details: z.unknown().optional(),
    }),
  })
  .meta({ id: 'ErrorBody' });
export type ErrorBody = z.infer<typeof errorBodySchema>;
