import { useState, type ReactNode } from 'react';
import { isDefusedFormula } from '@shared/price-list/formula-text';
import type { PriceListChange, PriceListChangeType, SupersessionState } from '@shared/schemas/price-lists';
import { ErrorNote } from '@/components/ui/panel';
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

interface Column {
  header: string;
  cell: (row: PriceListChange) => ReactNode;
  className?: string;
}

const line: Column = { header: 'Line', cell: (r) => r.line, className: 'w-12 text-ink-faint tabular-nums' };
// Number and brand together: two brands may print the same number.
const part: Column = {
  header: 'Part',
  cell: (r) => (
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
};
const description: Column = {
  header: 'Description',
  cell: (r) => (
    <>
      <span className="block max-w-[18rem] truncate 2xl:max-w-[28rem]" title={r.description ?? undefined}>
        {r.description ?? '—'}
      </span>
      {r.description !== null && isDefusedFormula(r.description) && (
        <span className="block text-xs text-review">Began like a spreadsheet formula: an apostrophe now keeps it as text.</span>
      )}
    </>
  ),
  className: 'text-ink-soft',
};
const cost: Column = { header: 'Cost', cell: (r) => formatMoney(r.newCostCents), className: 'tabular-nums text-right' };
const list: Column = { header: 'List', cell: (r) => formatMoney(r.newListCents), className: 'tabular-nums text-right' };

const COLUMNS: Record<PriceListChangeType, Column[]> = {
  new: [
    line,
    part,
    { header: 'Kind', cell: (r) => r.kind ?? '—' },
    description,
    cost,
    list,
    { header: 'Core', cell: (r) => (r.newCoreCents ? formatMoney(r.newCoreCents) : '—'), className: 'tabular-nums text-right' },
    { header: 'Pack', cell: (r) => r.newPackQty ?? '—', className: 'tabular-nums text-right' },
    {
      header: 'Spec',
      cell: (r) => (r.specStored ? 'from the file' : <span className="whitespace-nowrap text-review">no spec — no verdict</span>),
      className: 'text-sm',
    },
  ],
  changed: [
    line,
    part,
    description,
    {
      header: 'Cost',
      cell: (r) => (
        <>
          <PriceMove from={r.oldCostCents} to={r.newCostCents} pct={r.costChangePct} />
          {r.oldCostCents === null && <span className="block text-xs text-ink-soft">first price</span>}
        </>
      ),
    },
    {
      header: 'List',
      cell: (r) => (
        <>
          <PriceMove from={r.oldListCents} to={r.newListCents} pct={r.listChangePct} />
          <OtherMoves row={r} />
        </>
      ),
    },
    { header: 'Check', cell: (r) => (r.flagged ? <FlagMark /> : null) },
  ],
  supersession: [
    line,
    { header: 'Old number', cell: (r) => r.supersedes ?? '—', className: 'font-mono text-sm whitespace-nowrap text-ink-soft' },
    { ...part, header: 'Replaced by' },
    description,
    { header: 'Link', cell: (r) => (r.supersession ? SUPERSESSION_TEXT[r.supersession] : '—'), className: 'text-sm' },
  ],
  unchanged: [line, part, description, cost, list],
};

const EMPTY: Record<PriceListChangeType, string> = {
  new: 'No new parts in this file.',
  changed: 'No price moves in this file.',
  supersession: 'No supersessions in this file.',
  unchanged: 'Every row changes something.',
};

/** One kind of change in the staged list, a page at a time. */
export function ChangeTable({ listId, type }: { listId: string; type: PriceListChangeType }) {
  const [offset, setOffset] = useState(0);
  const changes = usePriceListChanges({ id: listId, type, offset, limit: PAGE });
  const columns = COLUMNS[type];
  if (changes.error) return <ErrorNote error={changes.error} />;
  if (!changes.data) return <p className="py-3 text-ink-soft">Loading…</p>;
  if (changes.data.total === 0) return <p className="py-3 text-ink-soft">{EMPTY[type]}</p>;
  return (
    <>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-[15px]">
          <thead className="border-b border-ink/10 text-xs uppercase tracking-wide text-ink-soft">
            <tr>
              {columns.map((c) => (
                <th key={c.header} className={`whitespace-nowrap py-1.5 pr-3 ${c.className?.includes('text-right') ? 'text-right' : ''}`}>
                  {c.header}
                </th>
              ))}
            </tr>
          </thead>
          <tbody className={changes.isPlaceholderData ? 'opacity-60' : ''}>
            {changes.data.changes.map((row) => (
              <tr
                key={`${row.line}-${row.partNumber}`}
                className={`border-b border-ink/5 ${row.flagged && type === 'changed' ? 'bg-review-soft/50' : ''}`}
              >
                {columns.map((c) => (
                  <td key={c.header} className={`py-1.5 pr-3 align-top ${c.className ?? ''}`}>
                    {c.cell(row)}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <Pager offset={offset} limit={PAGE} total={changes.data.total} onOffset={setOffset} />
    </>
  );
}
