import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { partSummarySchema } from '@shared/schemas/catalog';
import { coilSpecSchema, resolvedPlugSpecSchema } from '@shared/schemas/specs';
import { api } from '@/lib/api-client';
import { compareKeys } from './keys';

// Only what Compare shows of a part: who it is and its spec (coil or plug, null without one).
const partResponseSchema = z.object({
  part: partSummarySchema,
  spec: z.union([coilSpecSchema, resolvedPlugSpecSchema]).nullable(),
});
export type PartWithSpec = z.infer<typeof partResponseSchema>;

export const getPart = (id: string): Promise<PartWithSpec> =>
  api('GET', `/api/parts/${encodeURIComponent(id)}`, { schema: partResponseSchema });

export const partQueryOptions = (id: string | null) =>
  queryOptions({ queryKey: compareKeys.part(id ?? ''), queryFn: id === null ? skipToken : () => getPart(id), staleTime: 60_000 });

export const usePart = (id: string | null) => useQuery(partQueryOptions(id));
