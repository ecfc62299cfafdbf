import { useParams } from 'react-router-dom';
import { ApiError } from '@/lib/api-client';
import { ErrorNote } from '@/components/ui/panel';
import { useSharedFitReport } from '@/features/fit-reports/api/get-shared-fit-report';
import { FitReportDocument } from '@/features/fit-reports/components/fit-report-document';
import { PrintButton } from '@/features/fit-reports/components/print-button';

/** A fit report opened by its share link: read-only, outside the app's layout, no sign-in. */
export function SharedFitReportPage() {
  const { token = '' } = useParams();
  const report = useSharedFitReport(token);
  const notFound = report.error instanceof ApiError && report.error.status === 404;
  return (
    <div className="min-h-screen">
      <header className="bg-accent-strong print:bg-transparent">
        <div className="mx-auto flex max-w-[1400px] items-center justify-between gap-3 px-4 py-2">
          <span className="text-lg font-semibold tracking-tight text-white print:text-ink">Arcwise · shared fit report</span>
          <span className="text-sm text-white/85 print:hidden">Read-only</span>
        </div>
      </header>
      <main className="mx-auto max-w-[1400px] px-4 py-5">
        <div className="mb-3 flex justify-end print:hidden">{report.data && <PrintButton />}</div>
        {notFound ? (
          <p role="alert" className="text-lg text-ink">
            This link does not lead to a fit report. Ask the sender for a new link.
          </p>
        ) : (
          <ErrorNote error={report.error} />
        )}
        {report.isPending && <p className="text-ink-soft">Loading…</p>}
        {report.data && <FitReportDocument report={report.data} />}
      </main>
    </div>
  );
}
