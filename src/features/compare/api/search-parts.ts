import { keepPreviousData, queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { searchResponseSchema, type SearchHit } from '@shared/schemas/search';
import type { PartKind } from '@shared/schemas/specs';
import { api } from '@/lib/api-client';
import { compareKeys } from './keys';

const PICKER_LIMIT = 8;

export const searchParts = async (kind: PartKind, q: string, signal?: AbortSignal): Promise<SearchHit[]> =>
  (
    await api('GET', `/api/search?${new URLSearchParams({ q: q.trim(), kind, limit: String(PICKER_LIMIT) })}`, {
      schema: searchResponseSchema,
      signal,
    })
  ).hits;

export const searchPartsQueryOptions = (kind: PartKind, q: string) =>
  queryOptions({
    queryKey: compareKeys.search(kind, q.trim()),
    queryFn: q.trim().length >= 2 ? ({ signal }) => searchParts(kind, q, signal) : skipToken,
    placeholderData: keepPreviousData,
    staleTime: 30_000,
  });

/** Parts of one kind for a picker: a number of whichever brand, or words, from two characters on. */
export const useSearchParts = (kind: PartKind, q: string) => useQuery(searchPartsQueryOptions(kind, q));
