import { createColumnHelper } from '@tanstack/react-table';
import { useMemo, type Ref } from 'react';
import type { SearchHit } from '@shared/schemas/search';
import { checkLabel } from '@/features/compat/components/check-labels';
import { VerdictBadge } from '@/features/compat/components/verdict-badge';
import { DataTable, type DataTableHandle } from '@/components/ui/data-table';
import { StockNote } from '@/features/parts/components/stock-note';
import { matchLabel } from '../match-label';
import { useMediaQuery } from '../use-media-query';

export type ResultsTableHandle = DataTableHandle;

const column = createColumnHelper<SearchHit>();

// Tailwind's `sm`: below it the screen is a phone's.
const WIDE = '(min-width: 640px)';

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
  openPartId,
  onOpen,
  onLeaveTop,
  ref,
}: {
  hits: SearchHit[];
  query: string;
  openPartId: string | null;
  onOpen: (partId: string) => void;
  onLeaveTop?: () => void;
  ref?: Ref<ResultsTableHandle>;
}) {
  const columns = useMemo(
    () => [
      // On a phone one column carries the part (number, brand, description), so the table fits.
      column.display({
        id: 'part',
        header: 'Part',
        cell: (c) => (
          <>
            <span className="font-mono font-semibold whitespace-nowrap">{c.row.original.partNumber}</span>{' '}
            <span className="text-ink-soft">{c.row.original.brand}</span>
            <span className="block text-sm">
              {c.row.original.description}
              {!c.row.original.hasSpec && <span className="ml-2 text-review">(no spec)</span>}
            </span>
          </>
        ),
      }),
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
        id: 'stock',
        header: 'Stock',
        cell: (c) => <StockNote stock={c.row.original.stock ?? { inStock: c.row.original.inStock }} />,
      }),
    ],
    [query],
  );
  const wide = useMediaQuery(WIDE);

  return (
    <DataTable
      ref={ref}
      label="Search results"
      data={hits}
      columns={columns}
      getRowId={(h) => h.partId}
      // With no words typed every hit is a spec match: the column would only repeat itself.
      columnVisibility={{
        matched: query.trim() !== '',
        part: !wide,
        partNumber: wide,
        brand: wide,
        kind: wide,
        description: wide,
      }}
      onRowOpen={(h) => onOpen(h.partId)}
      openRowId={openPartId}
      {...(onLeaveTop ? { onLeaveTop } : {})}
    />
  );
}
