import { createColumnHelper } from '@tanstack/react-table';
import { useState } from 'react';
import { PRICE_LIST_ERROR_SORTS, type PriceListRowError } from '@shared/schemas/price-lists';
import { DataTable } from '@/components/ui/data-table';
import { Pager } from '@/components/ui/pager';
import { ErrorNote } from '@/components/ui/panel';
import { useServerSorting } from '@/components/ui/server-sorting';
import { priceListErrorsCsvUrl, usePriceListErrors } from '../api/get-price-list-errors';

const PAGE = 50;

// A line rejected for two reasons has two rows: line, column and position make the row's id.
type RejectedRow = PriceListRowError & { key: string };

const col = createColumnHelper<RejectedRow>();
// Column ids are the server's sort keys.
const COLUMNS = [
  col.accessor('line', { id: 'line', header: 'Line', enableSorting: true, meta: { align: 'right', cellClassName: 'w-16' } }),
  col.accessor('column', {
    id: 'column',
    header: 'Column',
    enableSorting: true,
    cell: (c) => c.getValue() ?? '—',
    meta: { cellClassName: 'w-48 font-mono text-sm' },
  }),
  col.accessor('message', { header: 'Reason' }),
];

/** The rows the server refused, with where and why, and the whole list as a CSV download. */
export function RejectedRows({ listId }: { listId: string }) {
  const [offset, setOffset] = useState(0);
  const sorting = useServerSorting(PRICE_LIST_ERROR_SORTS, { id: 'line', desc: false }, () => setOffset(0));
  const errors = usePriceListErrors({ id: listId, sort: sorting.sort, dir: sorting.dir, offset, limit: PAGE });
  if (errors.error) return <ErrorNote error={errors.error} />;
  if (!errors.data) return <p className="py-3 text-ink-soft">Loading…</p>;
  if (errors.data.total === 0) return <p className="py-3 text-ink-soft">No rows were rejected.</p>;
  const rows = errors.data.errors.map((e, i) => ({ ...e, key: `${e.line}-${e.column ?? ''}-${offset + i}` }));
  return (
    <>
      <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm text-ink-soft">
          These rows stay out of the commit; the other rows go in. Fix them in the file and upload it again.
        </p>
        <a
          href={priceListErrorsCsvUrl(listId)}
          download
          className="whitespace-nowrap rounded-md border border-ink/20 bg-paper-raised px-3 py-1.5 text-sm font-medium text-ink hover:bg-paper-sunk"
        >
          Download rejected rows (CSV)
        </a>
      </div>
      {/* The last page stays dimmed on screen while the next one loads. */}
      <div className={errors.isPlaceholderData ? 'opacity-60' : ''}>
        <DataTable
          label="Rejected rows"
          data={rows}
          columns={COLUMNS}
          getRowId={(r) => r.key}
          sorting={sorting.sorting}
          onSortingChange={sorting.onSortingChange}
        />
      </div>
      <Pager offset={offset} limit={PAGE} total={errors.data.total} onOffset={setOffset} />
    </>
  );
}
