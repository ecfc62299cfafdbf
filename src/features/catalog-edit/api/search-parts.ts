import { keepPreviousData, queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { searchResponseSchema, type SearchHit } from '@shared/schemas/search';
import type { PartKind } from '@shared/schemas/specs';
import { api } from '@/lib/api-client';
import { catalogEditKeys } from './keys';

const FINDER_LIMIT = 12;
export const MIN_SEARCH_CHARS = 2;

export async function searchParts(q: string, kind: PartKind | null, signal?: AbortSignal): Promise<SearchHit[]> {
  const params = new URLSearchParams({ q: q.trim(), limit: String(FINDER_LIMIT) });
  if (kind) params.set('kind', kind);
  return (await api('GET', `/api/search?${params}`, { schema: searchResponseSchema, signal })).hits;
}

export const searchPartsQueryOptions = (q: string, kind: PartKind | null) =>
  queryOptions({
    queryKey: catalogEditKeys.search(q.trim(), kind),
    queryFn: q.trim().length >= MIN_SEARCH_CHARS ? ({ signal }) => searchParts(q, kind, signal) : skipToken,
    placeholderData: keepPreviousData,
  });

/** Parts by any number (ours, another brand's, a superseded one) or words; of one kind when given. */
export const useSearchParts = (q: string, kind: PartKind | null) => useQuery(searchPartsQueryOptions(q, kind));
