import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { VerdictBadge } from '@/features/compat/components/verdict-badge';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { ConfirmDialog } from '@/components/ui/dialog';
import type { FitReportSummary } from '@shared/schemas/fit-reports';
import { formatDateTime } from '@shared/format';
import { useArchiveFitReport } from '../api/archive-fit-report';
import { vehicleText } from './fit-report-document';

function ArchiveButton({ report }: { report: FitReportSummary }) {
  const archive = useArchiveFitReport();
  const archived = report.archivedAt !== null;
  return (
    <ConfirmDialog
      title={archived ? `Restore “${report.title}”?` : `Archive “${report.title}”?`}
      confirmLabel={archived ? 'Restore' : 'Archive'}
      trigger={
        <Button variant="ghost" className="!py-1" aria-label={`${archived ? 'Restore' : 'Archive'} ${report.title}`}>
          {archived ? 'Restore' : 'Archive'}
        </Button>
      }
      onConfirm={() => archive.mutateAsync({ id: report.id, archived: !archived })}
    >
      {archived ? (
        <p>The report comes back to the list.</p>
      ) : (
        <p>The report leaves the list (show archived reports to find it). Nothing is deleted, and its share link still opens it.</p>
      )}
    </ConfirmDialog>
  );
}

const col = createColumnHelper<FitReportSummary>();

/** Saved reports: what was compared on which vehicle, the verdict, who and when. */
export function FitReportList({ reports, empty }: { reports: FitReportSummary[]; empty: string }) {
  const columns = useMemo(
    () => [
      col.accessor('title', {
        header: 'Report',
        enableSorting: true,
        cell: (c) => (
          <Link to={`/fit-reports/${c.row.original.id}`} className="font-medium text-accent underline-offset-2 hover:underline">
            {c.getValue()}
          </Link>
        ),
      }),
      col.accessor((r) => (r.vehicle ? vehicleText(r.vehicle) : '—'), { id: 'vehicle', header: 'Vehicle', enableSorting: true }),
      col.accessor((r) => `${r.substituteLabel} for ${r.originalLabel}`, {
        id: 'parts',
        header: 'Parts',
        cell: (c) => (
          <span className="font-mono text-sm">
            {c.row.original.substituteLabel} <span className="font-sans text-ink-soft">for</span> {c.row.original.originalLabel}
          </span>
        ),
      }),
      col.accessor('verdict', { header: 'Verdict', enableSorting: true, cell: (c) => <VerdictBadge verdict={c.getValue()} /> }),
      col.accessor((r) => `${r.createdBy}${r.shopName ? `, ${r.shopName}` : ''}`, { id: 'by', header: 'Saved by' }),
      col.accessor('createdAt', {
        header: 'When',
        enableSorting: true,
        cell: (c) => (
          <time dateTime={c.getValue()} className="whitespace-nowrap">
            {formatDateTime(c.getValue())}
          </time>
        ),
      }),
      col.display({
        id: 'archive',
        header: () => <span className="sr-only">Archive</span>,
        cell: (c) => <ArchiveButton report={c.row.original} />,
      }),
    ],
    [],
  );
  return (
    <DataTable
      label="Fit reports"
      data={reports}
      columns={columns}
      getRowId={(r) => r.id}
      initialSorting={[{ id: 'createdAt', desc: true }]}
      empty={empty}
    />
  );
}
