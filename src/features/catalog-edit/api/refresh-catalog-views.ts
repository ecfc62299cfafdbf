import type { QueryClient } from '@tanstack/react-query';

/**
 * After a catalog edit, every answer that may show the part is out of date: the Counter's search,
 * Compare's pickers, the part panel, an engine's alternates. Each feature keeps its query keys to
 * itself, so everything is marked stale; only what is on screen refetches now, the rest on its
 * next use.
 */
export const refreshCatalogViews = (qc: QueryClient): Promise<void> => qc.invalidateQueries();
