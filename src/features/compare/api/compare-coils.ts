import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { compatResultSchema, type CoilCompareBody, type CompatResult } from '@shared/schemas/compat';
import { api } from '@/lib/api-client';
import { compareKeys } from './keys';

export const compareCoils = (body: CoilCompareBody, signal?: AbortSignal): Promise<CompatResult> =>
  api('POST', '/api/compat/coil', { body, schema: compatResultSchema, signal });

// A comparison changes nothing on the server: it is read like a query, cached by its inputs.
export const compareCoilsQueryOptions = (body: CoilCompareBody | null) =>
  queryOptions({
    queryKey: body ? compareKeys.coil(body) : ['compare', 'coil', 'none'],
    queryFn: body ? ({ signal }) => compareCoils(body, signal) : skipToken,
    retry: false,
    staleTime: 60_000,
  });

/** The coil comparison, once original, substitute and engine are all chosen. */
export const useCompareCoils = (body: CoilCompareBody | null) => useQuery(compareCoilsQueryOptions(body));
