import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { compatResultSchema, type PlugCompareBody, type CompatResult } from '@shared/schemas/compat';
import { api } from '@/lib/api-client';
import { compareKeys } from './keys';

export const comparePlugs = (body: PlugCompareBody, signal?: AbortSignal): Promise<CompatResult> =>
  api('POST', '/api/compat/plug', { body, schema: compatResultSchema, signal });

// A comparison changes nothing on the server: it is read like a query, cached by its inputs.
export const comparePlugsQueryOptions = (body: PlugCompareBody | null) =>
  queryOptions({
    queryKey: body ? compareKeys.plug(body) : ['compare', 'plug', 'none'],
    queryFn: body ? ({ signal }) => comparePlugs(body, signal) : skipToken,
    retry: false,
    staleTime: 60_000,
  });

/** The plug comparison (the voltage from the engine's fitted coil), once original, substitute and engine are all chosen. */
export const useComparePlugs = (body: PlugCompareBody | null) => useQuery(comparePlugsQueryOptions(body));
