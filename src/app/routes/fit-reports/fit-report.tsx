import { Link, useParams } from 'react-router-dom';
import { ErrorNote, Panel } from '@/components/ui/panel';
import { useFitReport } from '@/features/fit-reports/api/get-fit-report';
import { EmailForm } from '@/features/fit-reports/components/email-form';
import { FitReportDocument } from '@/features/fit-reports/components/fit-report-document';
import { PrintButton } from '@/features/fit-reports/components/print-button';
import { ShareLink } from '@/features/fit-reports/components/share-link';

/** One fit report: the document, with its share link, e-mail and print beside it. */
export function FitReportPage() {
  const { id = '' } = useParams();
  const report = useFitReport(id);
  return (
    <>
      <div className="mb-3 flex flex-wrap items-center justify-between gap-3 print:hidden">
        <Link to="/fit-reports" className="text-sm font-medium text-accent hover:underline">
          ← All fit reports
        </Link>
        <PrintButton />
      </div>
      <ErrorNote error={report.error} />
      {report.isPending && <p className="text-ink-soft">Loading…</p>}
      {report.data && (
        <div className="flex flex-col gap-4">
          <Panel title="Share and send" className="print:hidden">
            <div className="grid gap-4 md:grid-cols-2">
              <ShareLink url={report.data.shareUrl} />
              <EmailForm reportId={report.data.id} />
            </div>
          </Panel>
          <FitReportDocument report={report.data} />
        </div>
      )}
    </>
  );
}
