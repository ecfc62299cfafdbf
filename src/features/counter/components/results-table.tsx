import { createColumnHelper } from '@tanstack/react-table';
import { useMemo, type Ref } from 'react';
import { formatChainStock } from '@shared/format';
import type { SearchHit } from '@shared/schemas/search';
import { checkLabel } from '@/components/compat/check-labels';
import { VerdictBadge } from '@/components/compat/verdict-badge';
import { DataTable, type DataTableHandle } from '@/components/ui/data-table';
import { matchLabel } from '../match-label';

export type ResultsTableHandle = DataTableHandle;

const column = createColumnHelper<SearchHit>();

/** This store's count first, then the other stores' ("0 here · 3 at Eastgate"); yes/no for a technician. */
function stockText(hit: SearchHit, showOnHand: boolean): string {
  if (showOnHand && hit.stock) return formatChainStock(hit.stock);
  return hit.inStock ? 'yes' : 'no';
}

/**
 * How the hit matched and, for an interchange claim, its verdict with the checks that decided
 * it: a wrong cross-reference row must not look like a right one.
 */
function MatchedCell({ hit, query }: { hit: SearchHit; query: string }) {
  const check = hit.check;
  return (
    <>
      <span className="text-ink-soft">{matchLabel(hit, query)}</span>
      {check && (
        <span className="mt-0.5 flex flex-wrap items-center gap-x-1.5" title={`judged on ${check.engine}`}>
          <VerdictBadge verdict={check.verdict} />
          {check.concerns.length > 0 && <span className="text-sm">{check.concerns.map((c) => checkLabel(c.id)).join(', ')}</span>}
        </span>
      )}
    </>
  );
}

/**
 * Search hits as a keyboard grid (the kit's DataTable): one tab stop (the selected row), ↑/↓,
 * PageUp/PageDown, Home/End move the selection, Enter (or a click) opens the part. ↑ on the
 * first row hands the keyboard back to the search box.
 */
export function ResultsTable({
  hits,
  query,
  showOnHand,
  openPartId,
  onOpen,
  onLeaveTop,
  ref,
}: {
  hits: SearchHit[];
  query: string;
  /** Technicians see in stock yes/no only, never the store's count. */
  showOnHand: boolean;
  openPartId: string | null;
  onOpen: (partId: string) => void;
  onLeaveTop?: () => void;
  ref?: Ref<ResultsTableHandle>;
}) {
  const columns = useMemo(
    () => [
      column.accessor('partNumber', {
        header: 'Part number',
        cell: (c) => <span className="font-mono font-semibold whitespace-nowrap">{c.getValue()}</span>,
      }),
      column.accessor('brand', { header: 'Brand' }),
      column.accessor('kind', { header: 'Kind' }),
      column.accessor('description', {
        header: 'Description',
        cell: (c) => (
          <>
            {c.getValue()}
            {!c.row.original.hasSpec && <span className="ml-2 text-sm text-review">(no spec)</span>}
          </>
        ),
      }),
      column.display({
        id: 'matched',
        header: 'Matched',
        cell: (c) => <MatchedCell hit={c.row.original} query={query} />,
      }),
      column.display({
        id: 'inStock',
        header: 'In stock',
        cell: (c) => <span className="whitespace-nowrap">{stockText(c.row.original, showOnHand)}</span>,
      }),
    ],
    [query, showOnHand],
  );

  return (
    <DataTable
      ref={ref}
      label="Search results"
      data={hits}
      columns={columns}
      getRowId={(h) => h.partId}
      // With no words typed every hit is a spec match: the column would only repeat itself.
      columnVisibility={{ matched: query.trim() !== '' }}
      onRowOpen={(h) => onOpen(h.partId)}
      openRowId={openPartId}
      {...(onLeaveTop ? { onLeaveTop } : {})}
    />
  );
}
