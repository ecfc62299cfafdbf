import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useImperativeHandle, useMemo, useRef, useState, type KeyboardEvent, type Ref } from 'react';
import type { SearchHit } from '@shared/schemas/search';
import { checkLabel } from '@/components/compat/check-labels';
import { VerdictBadge } from '@/components/compat/verdict-badge';
import { matchLabel } from '../match-label';

export interface ResultsTableHandle {
  /** Puts the keyboard on the selected row (the first one when nothing is selected). */
  focusSelected(): void;
}

const column = createColumnHelper<SearchHit>();

function stockText(hit: SearchHit, showOnHand: boolean): string {
  if (!hit.inStock) return 'no';
  return showOnHand ? `yes · ${hit.onHand}` : 'yes';
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

// Keys that move the selection, and by how many rows.
const STEP: Record<string, number> = { ArrowDown: 1, ArrowUp: -1, PageDown: 10, PageUp: -10 };

/**
 * Search hits as a keyboard grid: one tab stop (the selected row), ↑/↓, PageUp/PageDown,
 * Home/End move the selection, Enter (or a click) opens the part. ↑ on the first row hands the
 * keyboard back to the search box.
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
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const rowEls = useRef(new Map<string, HTMLTableRowElement>());
  // A new answer may not hold the old selection: the first row is then the selected one.
  const selected = hits.some((h) => h.partId === selectedId) ? selectedId : (hits[0]?.partId ?? null);

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

  const table = useReactTable({
    data: hits,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (h) => h.partId,
    // With no words typed every hit is a spec match: the column would only repeat itself.
    state: { columnVisibility: { matched: query.trim() !== '' } },
  });

  const focusRow = (id: string | null) => {
    if (id === null) return;
    setSelectedId(id);
    rowEls.current.get(id)?.focus();
  };

  useImperativeHandle(ref, () => ({ focusSelected: () => focusRow(selected) }));

  const onKeyDown = (e: KeyboardEvent<HTMLTableRowElement>, index: number) => {
    const last = hits.length - 1;
    let next: number | null = null;
    const step = STEP[e.key];
    if (step !== undefined) {
      if (step < 0 && index === 0 && onLeaveTop) {
        e.preventDefault();
        onLeaveTop();
        return;
      }
      next = Math.min(last, Math.max(0, index + step));
    } else if (e.key === 'Home') next = 0;
    else if (e.key === 'End') next = last;
    else if (e.key === 'Enter' || e.key === ' ') {
      e.preventDefault();
      onOpen(hits[index]!.partId);
      return;
    }
    if (next === null) return;
    e.preventDefault();
    focusRow(hits[next]?.partId ?? null);
  };

  return (
    <table role="grid" aria-label="Search results" aria-rowcount={hits.length + 1} className="w-full border-collapse text-left text-[15px]">
      <thead className="border-b border-ink/15 text-xs uppercase tracking-wide text-ink-soft">
        {table.getHeaderGroups().map((group) => (
          <tr key={group.id}>
            {group.headers.map((h) => (
              <th key={h.id} scope="col" className="px-2 py-2 font-semibold whitespace-nowrap">
                {flexRender(h.column.columnDef.header, h.getContext())}
              </th>
            ))}
          </tr>
        ))}
      </thead>
      <tbody>
        {table.getRowModel().rows.map((row, index) => {
          const isSelected = row.id === selected;
          const isOpen = row.id === openPartId;
          return (
            <tr
              key={row.id}
              ref={(el) => {
                if (el) rowEls.current.set(row.id, el);
                else rowEls.current.delete(row.id);
              }}
              tabIndex={isSelected ? 0 : -1}
              aria-selected={isSelected}
              aria-current={isOpen || undefined}
              onKeyDown={(e) => onKeyDown(e, index)}
              onClick={() => {
                setSelectedId(row.id);
                onOpen(row.id);
              }}
              className={`cursor-pointer border-b border-ink/5 align-top outline-offset-[-3px] ${
                isSelected ? 'bg-accent-soft' : 'hover:bg-paper-sunk'
              } ${isOpen ? 'shadow-[inset_4px_0_0_0_#0f6b6b]' : ''}`}
            >
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} role="gridcell" className="px-2 py-1.5">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
