import { keepPreviousData, queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { searchResponseSchema, type SearchHit } from '@shared/schemas/search';
import { api } from '@/lib/api-client';
import { benchKeys } from './keys';

export const searchCoils = async (q: string, signal?: AbortSignal): Promise<SearchHit[]> =>
  (
    await api('GET', `/api/search?${new URLSearchParams({ q: q.trim(), kind: 'coil', limit: '8' })}`, {
      schema: searchResponseSchema,
      signal,
    })
  ).hits;

export const searchCoilsQueryOptions = (q: string) =>
  queryOptions({
    queryKey: benchKeys.search(q.trim()),
    queryFn: q.trim().length >= 2 ? ({ signal }) => searchCoils(q, signal) : skipToken,
    placeholderData: keepPreviousData,
    staleTime: 30_000,
  });

/** Coils by any brand's number or words, for the bench: the part whose windows a reading is held to. */
export const useSearchCoils = (q: string) => useQuery(searchCoilsQueryOptions(q));
