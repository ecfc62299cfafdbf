import { createColumnHelper } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { formatTime } from '@shared/format';
import { DataTable } from '@/components/ui/data-table';
import type { Change } from '../changes';

// The same field may change twice in one save (two rows added): the position keeps rows apart.
type ChangeLine = Change & { key: string };

const col = createColumnHelper<ChangeLine>();
const COLUMNS = [
  col.accessor('what', { header: 'Field', meta: { rowHeader: true, cellClassName: 'pr-4 text-ink-soft sm:w-0 sm:whitespace-nowrap' } }),
  col.accessor('from', {
    header: 'Was',
    cell: (c) => (c.getValue() === '—' ? null : c.getValue()),
    meta: { cellClassName: 'w-0 whitespace-nowrap text-ink-soft tabular-nums' },
  }),
  col.accessor('to', {
    header: 'Now',
    cell: ({ row: { original: c }, table }) => (
      <>
        {table.getColumn('from')?.getIsVisible() && c.from !== '—' && (
          <span aria-hidden className="mr-1.5 text-ink-faint">
            →
          </span>
        )}
        {c.to}
      </>
    ),
    // A long name or number breaks anywhere rather than pushing the note wider than a phone.
    meta: { cellClassName: 'font-medium text-ink tabular-nums wrap-anywhere' },
  }),
];

/** What the last save changed, field by field, so the buyer sees the catalog took it. */
export function ChangeNote({
  title,
  changes,
  at,
  children,
}: {
  title: string;
  changes: readonly Change[];
  at: Date;
  children?: ReactNode;
}) {
  // A part or row just added has no "was": two columns read easier than an empty one.
  const allNew = changes.every((c) => c.from === '—');
  const lines = changes.map((c, i) => ({ ...c, key: `${c.what}-${i}` }));
  return (
    <div role="status" className="rounded-md border border-go/30 bg-go-soft/60 px-3 py-2 text-[15px]">
      <p className="font-semibold text-go">
        {title} <span className="font-normal text-ink-soft">· {formatTime(at)}</span>
      </p>
      {changes.length === 0 ? (
        <p className="text-ink-soft">Nothing differed from what was on file.</p>
      ) : (
        <div className="mt-1">
          <DataTable
            label={`${title}: what changed`}
            data={lines}
            columns={COLUMNS}
            getRowId={(c) => c.key}
            columnVisibility={{ from: !allNew }}
            hideHeader
            compact
          />
        </div>
      )}
      {children}
    </div>
  );
}
