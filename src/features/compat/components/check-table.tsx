import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import type { CheckRow } from '@shared/schemas/compat';
import { formatFigure } from '@shared/format';
import { DataTable } from '@/components/ui/data-table';
import { checkLabel } from './check-labels';
import { VerdictBadge } from './verdict-badge';

const ROW_TINT = {
  go: '',
  review: 'bg-review-soft/35',
  'no-go': 'bg-nogo-soft/45',
} as const;

const col = createColumnHelper<CheckRow>();

function SideHeader({ side, label }: { side: string; label: string }) {
  return (
    <>
      <span className="block">{side}</span>
      <span className="block font-normal normal-case tracking-normal text-ink-faint">{label}</span>
    </>
  );
}

/**
 * The check table: one row per check with its verdict (word and icon), the figures on both sides
 * with their units, and the one-sentence reason.
 */
export function CheckTable({
  checks,
  originalLabel = 'Original',
  substituteLabel = 'Substitute',
}: {
  checks: readonly CheckRow[];
  originalLabel?: string;
  substituteLabel?: string;
}) {
  const columns = useMemo(
    () => [
      col.accessor((c) => checkLabel(c.id), {
        id: 'check',
        header: 'Check',
        meta: { cellClassName: 'font-semibold whitespace-nowrap text-ink' },
      }),
      col.display({ id: 'verdict', header: 'Verdict', cell: ({ row }) => <VerdictBadge verdict={row.original.verdict} /> }),
      col.accessor((c) => formatFigure(c.original, c.unit), {
        id: 'original',
        header: () => <SideHeader side="Original" label={originalLabel} />,
        meta: { cellClassName: 'tabular-nums whitespace-nowrap' },
      }),
      col.accessor((c) => formatFigure(c.substitute, c.unit), {
        id: 'substitute',
        header: () => <SideHeader side="Substitute" label={substituteLabel} />,
        meta: { cellClassName: 'font-medium tabular-nums whitespace-nowrap' },
      }),
      col.accessor('reason', { header: 'Reason', meta: { cellClassName: 'min-w-[18rem] leading-snug text-ink-soft' } }),
    ],
    [originalLabel, substituteLabel],
  );
  return (
    <DataTable
      label={`Checks of ${substituteLabel} against ${originalLabel}`}
      data={[...checks]}
      columns={columns}
      getRowId={(c) => c.id}
      rowData={(c) => ({ 'data-check': c.id })}
      rowClassName={(c) => `print:bg-transparent ${ROW_TINT[c.verdict]}`}
    />
  );
}
