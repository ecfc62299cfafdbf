import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { partSummarySchema, priceSchema } from '@shared/schemas/catalog';
import { checkSchema, verdictSchema } from '@shared/schemas/compat';
import { api } from '@/lib/api-client';
import { catalogKeys } from './keys';
import { partRefSchema, partSpecSchema, stockViewSchema } from './response-shapes';

/** The claim judged: the foreign part's own spec against ours, on the engine named. */
const interchangeCheckSchema = z.object({
  verdict: verdictSchema,
  /** The checks that are not go, with their reasons. */
  concerns: z.array(checkSchema),
  engine: z.string(),
});

const interchangeRowSchema = z.object({
  id: z.string(),
  brand: z.string(),
  number: z.string(),
  source: z.string(),
  confidence: z.number(),
  /** The foreign part in our catalog, when we hold its spec: what Compare judges against. */
  originalPartId: z.string().nullable(),
  /** Null when there is nothing to judge from (no foreign spec, no engine). */
  check: interchangeCheckSchema.nullable().optional(),
});
export type InterchangeRow = z.infer<typeof interchangeRowSchema>;

const supersessionSchema = z.object({
  supersedes: z.array(partRefSchema),
  supersededBy: partRefSchema.nullable(),
  current: partRefSchema,
});
export type Supersession = z.infer<typeof supersessionSchema>;

const partResponseSchema = z.object({
  part: partSummarySchema,
  spec: partSpecSchema.nullable(),
  interchange: z.array(interchangeRowSchema),
  supersession: supersessionSchema,
  stock: stockViewSchema,
  /** The sell price: the lowest list price among the suppliers. */
  price: priceSchema.nullable(),
  /** One per supplier; cost and margin only for buyers and admins. */
  prices: z.array(priceSchema),
});
export type PartResponse = z.infer<typeof partResponseSchema>;

/** With an engine, each interchange claim is judged on that engine rather than the one the catalog infers. */
export const getPart = (id: string, engineId: string | null = null): Promise<PartResponse> =>
  api('GET', `/api/parts/${encodeURIComponent(id)}${engineId ? `?engineId=${encodeURIComponent(engineId)}` : ''}`, {
    schema: partResponseSchema,
  });

export const partQueryOptions = (id: string | null, engineId: string | null = null) =>
  queryOptions({ queryKey: catalogKeys.part(id ?? '', engineId), queryFn: id === null ? skipToken : () => getPart(id, engineId) });

export const usePart = (id: string | null, engineId: string | null = null) => useQuery(partQueryOptions(id, engineId));
