import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { partSummarySchema } from '@shared/schemas/catalog';
import { engineSpecSchema } from '@shared/schemas/specs';
import { api } from '@/lib/api-client';
import { compareKeys } from './keys';

// What Compare needs of an engine: its spec for the summary and its fitted parts for the default original.
const engineResponseSchema = z.object({
  engine: engineSpecSchema.extend({ id: z.string(), description: z.string() }),
  fitments: z.array(z.object({ part: partSummarySchema, position: z.string(), quantity: z.number().int() })),
});
export type EngineWithFitments = z.infer<typeof engineResponseSchema>;

export const getEngine = (id: string): Promise<EngineWithFitments> =>
  api('GET', `/api/engines/${encodeURIComponent(id)}`, { schema: engineResponseSchema });

export const engineQueryOptions = (id: string | null) =>
  queryOptions({ queryKey: compareKeys.engine(id ?? ''), queryFn: id === null ? skipToken : () => getEngine(id), staleTime: 60_000 });

export const useEngine = (id: string | null) => useQuery(engineQueryOptions(id));
