import {
  flexRender,
  getCoreRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type Header,
  type OnChangeFn,
  type RowData,
  type SortingState,
  type TableOptions,
  type VisibilityState,
} from '@tanstack/react-table';
import { useImperativeHandle, useRef, useState, type KeyboardEvent, type ReactNode, type Ref } from 'react';
import { Pager } from './pager';

/**
 * Every table of the app: TanStack Table for the rows and columns, this file for the markup.
 * Columns are TanStack column definitions (createColumnHelper); a column sorts only when it says
 * `enableSorting: true`. On a narrow screen the table scrolls sideways inside its own labelled
 * region, so the page never gets wider than the phone.
 *
 * A function `cell` is rendered as a component (TanStack's flexRender): give the columns a stable
 * identity (module level or useMemo), or a cell's input is mounted afresh on every render and
 * loses the focus. An editable cell reads what changes (handlers, errors) from its row or a context.
 */

declare module '@tanstack/react-table' {
  // eslint-disable-next-line @typescript-eslint/no-unused-vars -- the names must match TanStack's declaration
  interface ColumnMeta<TData extends RowData, TValue> {
    /** Figures line up on the right. */
    align?: 'right';
    /** Classes for the column's cells (not its header). */
    cellClassName?: string;
    /** The column names its row (a field's name beside its values): its cells are row headers. */
    rowHeader?: boolean;
  }
}

export interface DataTableHandle {
  /** Puts the keyboard on the selected row (the first when none is). Only with `onRowOpen`. */
  focusSelected(): void;
}

export interface DataTableProps<T> {
  /** Names the table and its scroll region for a screen reader ("Team", "Search results"). */
  label: string;
  data: T[];
  columns: TableOptions<T>['columns'];
  getRowId: (row: T) => string;
  /** Shown instead of the table when there are no rows. */
  empty?: ReactNode;
  /** Sorting the table keeps itself, starting here. */
  initialSorting?: SortingState;
  /** Sorting kept by the caller (rows sorted by the server): give both, and the rows arrive sorted. */
  sorting?: SortingState;
  onSortingChange?: OnChangeFn<SortingState>;
  columnVisibility?: VisibilityState;
  /**
   * Rows the table holds all of, shown this many at a time with the kit's Pager under them
   * (sorting covers every row). Rows the server pages take a Pager of their own instead.
   */
  pageSize?: number;
  /** Column names for screen readers only, where the rows speak for themselves (a short note). */
  hideHeader?: boolean;
  /** Smaller text, tighter rows, no rules between them: a table inside a note or a form. */
  compact?: boolean;
  /**
   * Makes the rows a keyboard grid: one tab stop (the selected row), ↑/↓, PageUp/PageDown,
   * Home/End move the selection, Enter, Space or a click open the row.
   */
  onRowOpen?: (row: T) => void;
  /** The opened row, marked for sight and for screen readers (aria-current). */
  openRowId?: string | null;
  /** ↑ on the first row: give the keyboard back (to a search box). */
  onLeaveTop?: () => void;
  rowClassName?: (row: T) => string;
  /** `data-*` attributes of a row (`{ 'data-check': id }`), for print styles and tests to find it. */
  rowData?: (row: T) => Record<`data-${string}`, string>;
  ref?: Ref<DataTableHandle>;
}

// Keys that move the selection, and by how many rows.
const STEP: Record<string, number> = { ArrowDown: 1, ArrowUp: -1, PageDown: 10, PageUp: -10 };

const ARIA_SORT = { asc: 'ascending', desc: 'descending' } as const;

function HeaderCell<T>({ header, compact }: { header: Header<T, unknown>; compact: boolean }) {
  const column = header.column;
  const align = column.columnDef.meta?.align === 'right' ? 'text-right' : '';
  const content = header.isPlaceholder ? null : flexRender(column.columnDef.header, header.getContext());
  if (!column.getCanSort())
    return (
      <th scope="col" className={`px-2 py-2 font-semibold whitespace-nowrap ${compact ? 'first:pl-0 last:pr-0' : ''} ${align}`}>
        {content}
      </th>
    );
  const sorted = column.getIsSorted();
  return (
    <th scope="col" aria-sort={sorted ? ARIA_SORT[sorted] : 'none'} className={`px-1 py-1 font-semibold whitespace-nowrap ${align}`}>
      <button
        type="button"
        onClick={column.getToggleSortingHandler()}
        className="inline-flex items-center gap-1 rounded px-1 py-1 uppercase tracking-wide hover:bg-paper-sunk hover:text-ink"
      >
        {content}
        <span aria-hidden="true" className={sorted ? 'text-accent-strong' : 'text-ink-faint'}>
          {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
        </span>
      </button>
    </th>
  );
}

export function DataTable<T>({
  label,
  data,
  columns,
  getRowId,
  empty = 'Nothing to show.',
  initialSorting = [],
  sorting,
  onSortingChange,
  columnVisibility,
  pageSize,
  hideHeader = false,
  compact = false,
  onRowOpen,
  openRowId = null,
  onLeaveTop,
  rowClassName,
  rowData,
  ref,
}: DataTableProps<T>) {
  const [ownSorting, setOwnSorting] = useState<SortingState>(initialSorting);
  const manual = sorting !== undefined;
  // The page is kept here rather than reset by TanStack on new data: a row retried or revoked
  // reloads the list, and the reader stays on the page they were reading (the last one if it shrank).
  const [pageIndex, setPageIndex] = useState(0);
  const pageCount = pageSize ? Math.max(1, Math.ceil(data.length / pageSize)) : 1;
  const page = Math.min(pageIndex, pageCount - 1);
  const table = useReactTable({
    data,
    columns,
    getRowId: (row) => getRowId(row),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    ...(pageSize ? { getPaginationRowModel: getPaginationRowModel(), autoResetPageIndex: false } : {}),
    manualSorting: manual,
    defaultColumn: { enableSorting: false },
    state: {
      sorting: sorting ?? ownSorting,
      ...(columnVisibility ? { columnVisibility } : {}),
      ...(pageSize ? { pagination: { pageIndex: page, pageSize } } : {}),
    },
    onSortingChange: (update) => {
      // A new order starts from its first page.
      setPageIndex(0);
      (onSortingChange ?? setOwnSorting)(update);
    },
  });
  const rows = table.getRowModel().rows;

  // Keyboard grid: which row holds the one tab stop.
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const rowEls = useRef(new Map<string, HTMLTableRowElement>());
  const selected = rows.some((r) => r.id === selectedId) ? selectedId : (rows[0]?.id ?? null);
  const focusRow = (id: string | null) => {
    if (id === null) return;
    setSelectedId(id);
    rowEls.current.get(id)?.focus();
  };
  useImperativeHandle(ref, () => ({ focusSelected: () => focusRow(selected) }));

  const onKeyDown = (e: KeyboardEvent<HTMLTableRowElement>, index: number) => {
    if (!onRowOpen || e.target !== e.currentTarget) return;
    const last = rows.length - 1;
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
      onRowOpen(rows[index]!.original);
      return;
    }
    if (next === null) return;
    e.preventDefault();
    focusRow(rows[next]?.id ?? null);
  };

  if (rows.length === 0) return <p className="py-3 text-[15px] text-ink-soft">{empty}</p>;

  const grid = onRowOpen !== undefined;
  const region = (
    // The region scrolls on a narrow screen; it takes the focus so a keyboard can scroll it too.
    // It is positioned so that visually hidden (absolute) labels inside stay inside its scroll.
    <div role="region" aria-label={label} tabIndex={0} className="relative max-w-full overflow-x-auto">
      <table
        aria-label={label}
        {...(grid ? { role: 'grid', 'aria-rowcount': rows.length + 1 } : {})}
        className={`w-full border-collapse text-left ${compact ? 'text-sm' : 'text-[15px]'}`}
      >
        <thead className={hideHeader ? 'sr-only' : 'border-b border-ink/15 text-xs uppercase tracking-wide text-ink-soft'}>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((h) => (
                <HeaderCell key={h.id} header={h} compact={compact} />
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.map((row, index) => {
            const isSelected = grid && row.id === selected;
            const isOpen = row.id === openRowId;
            return (
              <tr
                key={row.id}
                ref={(el) => {
                  if (el) rowEls.current.set(row.id, el);
                  else rowEls.current.delete(row.id);
                }}
                {...(grid
                  ? {
                      tabIndex: isSelected ? 0 : -1,
                      'aria-selected': isSelected,
                      onKeyDown: (e: KeyboardEvent<HTMLTableRowElement>) => onKeyDown(e, index),
                      onClick: () => {
                        setSelectedId(row.id);
                        onRowOpen(row.original);
                      },
                    }
                  : {})}
                {...rowData?.(row.original)}
                aria-current={isOpen || undefined}
                className={`${compact ? '' : 'border-b border-ink/5'} align-top ${
                  grid ? `cursor-pointer outline-offset-[-3px] ${isSelected ? 'bg-accent-soft' : 'hover:bg-paper-sunk'}` : ''
                } ${isOpen ? 'shadow-[inset_4px_0_0_0_#0f6b6b]' : ''} ${rowClassName?.(row.original) ?? ''}`}
              >
                {row.getVisibleCells().map((cell) => {
                  const meta = cell.column.columnDef.meta;
                  const Cell = meta?.rowHeader ? 'th' : 'td';
                  return (
                    <Cell
                      key={cell.id}
                      {...(meta?.rowHeader ? { scope: 'row' } : grid ? { role: 'gridcell' } : {})}
                      className={`${compact ? 'px-1.5 py-0.5 first:pl-0 last:pr-0' : 'px-2 py-1.5'} ${meta?.rowHeader ? 'font-medium' : ''} ${
                        meta?.align === 'right' ? 'text-right tabular-nums' : ''
                      } ${meta?.cellClassName ?? ''}`}
                    >
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </Cell>
                  );
                })}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
  if (!pageSize) return region;
  return (
    <>
      {region}
      <Pager
        offset={page * pageSize}
        limit={pageSize}
        total={data.length}
        onOffset={(offset) => setPageIndex(Math.floor(offset / pageSize))}
      />
    </>
  );
}
