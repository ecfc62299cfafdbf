import type { PartSearch } from './search-parts';

export const counterKeys = {
  search: (search: PartSearch) => ['counter', 'search', search] as const,
};
