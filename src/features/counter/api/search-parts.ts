import { keepPreviousData, queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { FACET_FIELDS, searchResponseSchema, type SearchResponse } from '@shared/schemas/search';
import type { PartKind } from '@shared/schemas/specs';
import { api } from '@/lib/api-client';
import { counterKeys } from './keys';

export type FacetField = (typeof FACET_FIELDS)[number];

/** Filter values as the controls hold them (text); the server's query schema coerces them. */
export type SpecFilters = Partial<Record<FacetField, string>>;

export interface PartSearch {
  q: string;
  kind: PartKind | null;
  filters: SpecFilters;
  limit: number;
  /** The picked vehicle's engine: interchange claims are judged on it. */
  engineId?: string | null;
  /** Ask for the spec fields' counts over every match (the filter controls want them). */
  facets?: boolean;
}

export function searchParams(search: PartSearch): URLSearchParams {
  const params = new URLSearchParams({ q: search.q.trim(), limit: String(search.limit) });
  if (search.kind) params.set('kind', search.kind);
  if (search.engineId) params.set('engineId', search.engineId);
  if (search.facets) params.set('facets', 'true');
  for (const field of FACET_FIELDS) {
    const value = search.filters[field]?.trim();
    if (value) params.set(field, value);
  }
  return params;
}

/** Nothing to ask the server yet: no words, no kind, no filter. */
export const isEmptySearch = (search: PartSearch): boolean =>
  search.q.trim() === '' && search.kind === null && FACET_FIELDS.every((f) => !search.filters[f]?.trim());

export const searchParts = (search: PartSearch, signal?: AbortSignal): Promise<SearchResponse> =>
  api('GET', `/api/search?${searchParams(search)}`, { schema: searchResponseSchema, signal });

export const searchPartsQueryOptions = (search: PartSearch) =>
  queryOptions({
    queryKey: counterKeys.search(search),
    queryFn: isEmptySearch(search) ? skipToken : ({ signal }) => searchParts(search, signal),
    // The table keeps the last answer while the next keystroke's answer is on its way.
    placeholderData: keepPreviousData,
    staleTime: 30_000,
  });

export const useSearchParts = (search: PartSearch) => useQuery(searchPartsQueryOptions(search));
