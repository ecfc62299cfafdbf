import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { partDetailSchema, type PartDetail } from '@shared/schemas/parts';
import { api } from '@/lib/api-client';
import { partKeys } from './keys';

/** With an engine, each interchange claim is judged on that engine rather than the one the catalog infers. */
export const getPart = (id: string, engineId: string | null = null): Promise<PartDetail> =>
  api('GET', `/api/parts/${encodeURIComponent(id)}${engineId ? `?engineId=${encodeURIComponent(engineId)}` : ''}`, {
    schema: partDetailSchema,
  });

export const partQueryOptions = (id: string | null, engineId: string | null = null) =>
  queryOptions({
    queryKey: partKeys.part(id ?? '', engineId),
    queryFn: id === null ? skipToken : () => getPart(id, engineId),
    staleTime: 60_000,
  });

export const usePart = (id: string | null, engineId: string | null = null) => useQuery(partQueryOptions(id, engineId));
