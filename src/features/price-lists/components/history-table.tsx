import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { FIELD_LABELS } from '@shared/price-list/fields';
import type { Mapping } from '@shared/price-list/mapping';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import type { PriceList } from '@shared/schemas/price-lists';
import { formatCount, formatDateTime } from '@shared/format';

const STATUS_TEXT: Record<PriceList['status'], string> = {
  processing: 'reading',
  staged: 'staged',
  committed: 'committed',
  discarded: 'discarded',
  failed: 'failed',
};

const STATUS_TONE: Record<PriceList['status'], string> = {
  processing: 'text-ink-soft',
  staged: 'text-review',
  committed: 'text-go',
  discarded: 'text-ink-faint',
  failed: 'text-nogo',
};

function MappingSummary({ mapping }: { mapping: Mapping }) {
  const entries = Object.entries(mapping);
  const used = entries.filter(([, f]) => f !== null);
  return (
    <details>
      <summary className="cursor-pointer whitespace-nowrap text-ink-soft">
        {used.length} of {entries.length} columns
      </summary>
      <ul className="mt-1 text-xs">
        {used.map(([column, field]) => (
          <li key={column} className="whitespace-nowrap">
            <span className="font-mono">{column}</span> → {field === null ? '' : FIELD_LABELS[field]}
          </li>
        ))}
      </ul>
    </details>
  );
}

const col = createColumnHelper<PriceList>();
const count = (key: 'total' | 'new' | 'changed' | 'unchanged' | 'rejected', header: string) =>
  col.accessor((l) => l.counts?.[key] ?? null, {
    id: key,
    header,
    enableSorting: true,
    meta: { align: 'right' },
    cell: (c) => {
      const n = c.getValue();
      return n === null ? '—' : formatCount(n);
    },
  });

/**
 * Every file uploaded for the supplier: who, when, which file, how it was read and what it did.
 * (The file's hash stays on the server, for refusing the same file twice.)
 */
export function HistoryTable({ lists, openId, onOpen }: { lists: PriceList[]; openId: string | null; onOpen: (id: string) => void }) {
  const columns = useMemo(
    () => [
      col.accessor((l) => l.committedAt ?? l.discardedAt ?? l.createdAt, {
        id: 'when',
        header: 'When',
        enableSorting: true,
        cell: (c) => <span className="whitespace-nowrap">{formatDateTime(c.getValue())}</span>,
      }),
      col.accessor((l) => (l.committedBy ?? l.createdBy)?.name ?? '—', { id: 'by', header: 'By' }),
      col.accessor('fileName', {
        header: 'File',
        cell: (c) => (
          <span className="block max-w-56 truncate" title={c.getValue()}>
            {c.getValue()}
          </span>
        ),
      }),
      col.display({ id: 'mapping', header: 'Mapping', cell: (c) => <MappingSummary mapping={c.row.original.mapping} /> }),
      count('total', 'Rows'),
      count('new', 'New'),
      count('changed', 'Changed'),
      count('unchanged', 'Unchanged'),
      count('rejected', 'Rejected'),
      col.accessor('status', {
        header: 'Status',
        cell: (c) => {
          const l = c.row.original;
          return (
            <span className={`whitespace-nowrap font-medium ${STATUS_TONE[l.status]}`}>
              {STATUS_TEXT[l.status]}
              {l.status === 'staged' && l.stale && <span className="font-normal text-ink-soft">, stale</span>}
            </span>
          );
        },
      }),
      col.display({
        id: 'open',
        header: () => <span className="sr-only">Open</span>,
        cell: (c) => {
          const l = c.row.original;
          return l.status === 'staged' && l.id !== openId ? (
            <Button variant="secondary" className="!py-1" aria-label={`Open ${l.fileName}`} onClick={() => onOpen(l.id)}>
              Open
            </Button>
          ) : null;
        },
      }),
    ],
    [openId, onOpen],
  );
  return (
    <DataTable
      label="Price-list history"
      data={lists}
      columns={columns}
      getRowId={(l) => l.id}
      openRowId={openId}
      empty="No price lists from this supplier yet."
    />
  );
}
