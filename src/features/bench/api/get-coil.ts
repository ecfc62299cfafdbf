import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { partSummarySchema } from '@shared/schemas/catalog';
import { coilSpecSchema, resolvedPlugSpecSchema } from '@shared/schemas/specs';
import { api } from '@/lib/api-client';
import { benchKeys } from './keys';

const partResponseSchema = z.object({
  part: partSummarySchema,
  spec: z.union([coilSpecSchema, resolvedPlugSpecSchema]).nullable(),
});
export type CoilPart = z.infer<typeof partResponseSchema>;

export const getCoil = (id: string): Promise<CoilPart> =>
  api('GET', `/api/parts/${encodeURIComponent(id)}`, { schema: partResponseSchema });

export const coilQueryOptions = (id: string | null) =>
  queryOptions({ queryKey: benchKeys.coil(id ?? ''), queryFn: id === null ? skipToken : () => getCoil(id), staleTime: 60_000 });

/** The chosen coil with its spec, for its resistance windows. */
export const useCoil = (id: string | null) => useQuery(coilQueryOptions(id));
