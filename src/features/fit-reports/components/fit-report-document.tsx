import type { FitReport } from '@shared/schemas/fit-reports';
import { CompatResultView } from '@/features/compat/components/compat-result-view';
import { formatDateTime } from '@shared/format';

/** The report itself, the same on screen, in its shared read-only view and on paper. */
export function FitReportDocument({ report }: { report: FitReport }) {
  return (
    <article aria-label={`Fit report: ${report.title}`}>
      <CompatResultView
        result={report.result}
        heading={
          <header className="mb-1 border-b border-ink/10 pb-2">
            <p className="text-xs font-semibold uppercase tracking-wide text-ink-soft">
              Fit report · {report.kind === 'coil' ? 'ignition coil' : 'spark plug'}
            </p>
            <h2 className="text-xl font-semibold text-ink">{report.title}</h2>
            <p className="text-sm text-ink-soft">
              Saved by {report.createdBy}
              {report.shopName ? `, ${report.shopName}` : ''} on <time dateTime={report.createdAt}>{formatDateTime(report.createdAt)}</time>
            </p>
            {report.notes && <p className="mt-1 whitespace-pre-wrap text-[15px] text-ink">{report.notes}</p>}
          </header>
        }
      />
    </article>
  );
}
