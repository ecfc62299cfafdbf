import type { OnChangeFn, SortingState } from '@tanstack/react-table';
import { useState } from 'react';
import type { SortDirection } from '@shared/schemas/common';

/**
 * Sorting for a table whose rows the server sorts and pages: DataTable's `sorting` and
 * `onSortingChange`, and the same as the `sort` and `dir` of the query. Column ids are the
 * server's sort keys. Sorting a column a third time goes back to `fallback` (file order, say)
 * rather than to no order, so the header arrows always show the order the rows are in; the
 * fallback's own column turns between its two directions.
 */
export function useServerSorting<K extends string>(
  keys: readonly K[],
  fallback: { id: K; desc: boolean },
  /** Called on every change: a new order starts from its first page. */
  onChange?: () => void,
): { sorting: SortingState; onSortingChange: OnChangeFn<SortingState>; sort: K; dir: SortDirection } {
  const [sorting, setSorting] = useState<SortingState>([fallback]);
  const onSortingChange: OnChangeFn<SortingState> = (update) => {
    setSorting((prev) => {
      const next = typeof update === 'function' ? update(prev) : update;
      if (next.length > 0) return next;
      // TanStack clears a column sorted against its first direction (a number column starts
      // descending): on the fallback column itself that is a turn to the other direction.
      const wasFallback = prev.length === 1 && prev[0]?.id === fallback.id && prev[0].desc === fallback.desc;
      return [wasFallback ? { id: fallback.id, desc: !fallback.desc } : fallback];
    });
    onChange?.();
  };
  const isKey = (id: string): id is K => (keys as readonly string[]).includes(id);
  const first = sorting[0];
  const current = first && isKey(first.id) ? { id: first.id, desc: first.desc } : fallback;
  return { sorting, onSortingChange, sort: current.id, dir: current.desc ? 'desc' : 'asc' };
}
