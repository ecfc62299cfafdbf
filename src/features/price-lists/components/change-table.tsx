import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import { useState } from 'react';
import { isDefusedFormula } from '@shared/price-list/formula-text';
import {
  PRICE_LIST_CHANGE_SORTS,
  type PriceListChange,
  type PriceListChangeType,
  type SupersessionState,
} from '@shared/schemas/price-lists';
import { DataTable } from '@/components/ui/data-table';
import { ErrorNote } from '@/components/ui/panel';
import { useServerSorting } from '@/components/ui/server-sorting';
import { usePriceListChanges } from '../api/get-price-list-changes';
import { formatMoney, formatPercentChange } from '@shared/format';
import { percentChange } from '../format';
import { FlagMark } from './flag-mark';
import { Pager } from '@/components/ui/pager';

const PAGE = 50;

/** "$24.50 → $25.20 +2.9%", or the one price when it did not move. */
export function PriceMove({ from, to, pct }: { from: number | null; to: number; pct?: number | null }) {
  if (from === null || from === to) {
    return (
      <span className="whitespace-nowrap tabular-nums">
        {formatMoney(to)}
        {from === to && <span className="ml-1.5 text-xs text-ink-faint">same</span>}
      </span>
    );
  }
  const move = pct ?? percentChange(from, to);
  return (
    <span className="whitespace-nowrap tabular-nums">
      <span className="text-ink-soft">{formatMoney(from)}</span>
      <span aria-label="to" className="px-1 text-ink-faint">
        →
      </span>
      <span className="font-medium">{formatMoney(to)}</span>
      {move !== null && <span className="ml-1.5 text-sm text-ink-soft">{formatPercentChange(move)}</span>}
    </span>
  );
}

/** Core charge and pack changes, which move less often and take less room. */
function OtherMoves({ row }: { row: PriceListChange }) {
  const moves: string[] = [];
  if (row.newCoreCents !== null && row.oldCoreCents !== null && row.newCoreCents !== row.oldCoreCents) {
    moves.push(`core ${formatMoney(row.oldCoreCents)} → ${formatMoney(row.newCoreCents)}`);
  }
  if (row.newPackQty !== null && row.oldPackQty !== null && row.newPackQty !== row.oldPackQty) {
    moves.push(`pack ${row.oldPackQty} → ${row.newPackQty}`);
  }
  if (moves.length === 0) return null;
  return <span className="block whitespace-nowrap text-xs text-ink-soft">{moves.join(' · ')}</span>;
}

const SUPERSESSION_TEXT: Record<SupersessionState, string> = {
  link: 'will be linked',
  already: 'already linked',
  'not-found': 'old number not in the catalog; not linked',
  'kind-mismatch': 'coil and plug; not linked',
  conflict: 'the old number already points elsewhere; not linked',
  loop: 'would make a loop; not linked',
};

const col = createColumnHelper<PriceListChange>();
type Columns = ColumnDef<PriceListChange, never>[];

// Column ids that the server sorts by (PRICE_LIST_CHANGE_SORTS) say so with enableSorting.
const line = col.accessor('line', {
  id: 'line',
  header: 'Line',
  enableSorting: true,
  meta: { align: 'right', cellClassName: 'w-12 text-ink-faint' },
});
// Number and brand together: two brands may print the same number.
const part = (header: string) =>
  col.accessor('partNumber', {
    id: 'partNumber',
    header,
    enableSorting: true,
    cell: ({ row: { original: r } }) => (
      <>
        <span className="block whitespace-nowrap font-mono text-sm font-semibold" title="As the supplier printed it">
          {r.partNumber}
        </span>
        {r.catalogNumber !== null && (
          <span className="block whitespace-nowrap text-xs text-ink-soft">
            catalog <span className="font-mono text-ink">{r.catalogNumber}</span>
          </span>
        )}
        <span className="block whitespace-nowrap text-xs text-ink-soft">{r.brand}</span>
      </>
    ),
  });
const description = col.accessor('description', {
  header: 'Description',
  cell: ({ row: { original: r } }) => (
    <>
      <span className="block max-w-[18rem] truncate 2xl:max-w-[28rem]" title={r.description ?? undefined}>
        {r.description ?? '—'}
      </span>
      {r.description !== null && isDefusedFormula(r.description) && (
        <span className="block text-xs text-review">Began like a spreadsheet formula: an apostrophe now keeps it as text.</span>
      )}
    </>
  ),
  meta: { cellClassName: 'text-ink-soft' },
});
const cost = col.accessor('newCostCents', {
  id: 'cost',
  header: 'Cost',
  enableSorting: true,
  cell: (c) => formatMoney(c.getValue()),
  meta: { align: 'right' },
});
const list = col.accessor('newListCents', {
  id: 'list',
  header: 'List',
  enableSorting: true,
  cell: (c) => formatMoney(c.getValue()),
  meta: { align: 'right' },
});

const COLUMNS: Record<PriceListChangeType, Columns> = {
  new: [
    line,
    part('Part'),
    col.accessor((r) => r.kind ?? '—', { id: 'kind', header: 'Kind' }),
    description,
    cost,
    list,
    col.accessor('newCoreCents', {
      id: 'core',
      header: 'Core',
      cell: (c) => {
        const cents = c.getValue();
        return cents ? formatMoney(cents) : '—';
      },
      meta: { align: 'right' },
    }),
    col.accessor((r) => r.newPackQty ?? '—', { id: 'pack', header: 'Pack', meta: { align: 'right' } }),
    col.accessor('specStored', {
      header: 'Spec',
      cell: (c) => (c.getValue() ? 'from the file' : <span className="whitespace-nowrap text-review">no spec — no verdict</span>),
      meta: { cellClassName: 'text-sm' },
    }),
  ],
  changed: [
    line,
    part('Part'),
    description,
    // Sorted by the size of the move: the biggest rises first, then the biggest drops first.
    col.accessor('costChangePct', {
      id: 'costChange',
      header: 'Cost',
      enableSorting: true,
      cell: ({ row: { original: r } }) => (
        <>
          <PriceMove from={r.oldCostCents} to={r.newCostCents} pct={r.costChangePct} />
          {r.oldCostCents === null && <span className="block text-xs text-ink-soft">first price</span>}
        </>
      ),
    }),
    col.accessor('listChangePct', {
      id: 'listChange',
      header: 'List',
      enableSorting: true,
      cell: ({ row: { original: r } }) => (
        <>
          <PriceMove from={r.oldListCents} to={r.newListCents} pct={r.listChangePct} />
          <OtherMoves row={r} />
        </>
      ),
    }),
    col.accessor('flagged', { header: 'Check', cell: (c) => (c.getValue() ? <FlagMark /> : null) }),
  ],
  supersession: [
    line,
    col.accessor((r) => r.supersedes ?? '—', {
      id: 'supersedes',
      header: 'Old number',
      meta: { cellClassName: 'font-mono text-sm whitespace-nowrap text-ink-soft' },
    }),
    part('Replaced by'),
    description,
    col.accessor((r) => (r.supersession ? SUPERSESSION_TEXT[r.supersession] : '—'), {
      id: 'link',
      header: 'Link',
      meta: { cellClassName: 'text-sm' },
    }),
  ],
  unchanged: [line, part('Part'), description, cost, list],
};

const LABEL: Record<PriceListChangeType, string> = {
  new: 'New parts',
  changed: 'Price changes',
  supersession: 'Supersessions',
  unchanged: 'Unchanged',
};

const EMPTY: Record<PriceListChangeType, string> = {
  new: 'No new parts in this file.',
  changed: 'No price moves in this file.',
  supersession: 'No supersessions in this file.',
  unchanged: 'Every row changes something.',
};

/** One kind of change in the staged list, a page at a time, sorted by the server. */
export function ChangeTable({ listId, type }: { listId: string; type: PriceListChangeType }) {
  const [offset, setOffset] = useState(0);
  const sorting = useServerSorting(PRICE_LIST_CHANGE_SORTS, { id: 'line', desc: false }, () => setOffset(0));
  const changes = usePriceListChanges({ id: listId, type, sort: sorting.sort, dir: sorting.dir, offset, limit: PAGE });
  if (changes.error) return <ErrorNote error={changes.error} />;
  if (!changes.data) return <p className="py-3 text-ink-soft">Loading…</p>;
  if (changes.data.total === 0) return <p className="py-3 text-ink-soft">{EMPTY[type]}</p>;
  return (
    <>
      {/* The last page stays dimmed on screen while the next one loads. */}
      <div className={changes.isPlaceholderData ? 'opacity-60' : ''}>
        <DataTable
          label={LABEL[type]}
          data={changes.data.changes}
          columns={COLUMNS[type]}
          getRowId={(r) => String(r.line)}
          sorting={sorting.sorting}
          onSortingChange={sorting.onSortingChange}
          rowClassName={(r) => (r.flagged && type === 'changed' ? 'bg-review-soft/50' : '')}
        />
      </div>
      <Pager offset={offset} limit={PAGE} total={changes.data.total} onOffset={setOffset} />
    </>
  );
}
