import type { FitReport, FitReportVehicle, SharedFitReport } from '@shared/schemas/fit-reports';
import { CompatResultView } from '@/features/compat/components/compat-result-view';
import { formatDateTime, formatMoney } from '@shared/format';

/** The vehicle as it was picked: year, make, model · engine. */
export const vehicleText = (v: FitReportVehicle) => `${v.year} ${v.make} ${v.model} · ${v.engine}`;

/**
 * The report itself, the same on screen, in its shared read-only view and on paper. The shared
 * view has no staff member's name (the server leaves it out).
 */
export function FitReportDocument({ report }: { report: FitReport | SharedFitReport }) {
  const by = 'createdBy' in report ? `Saved by ${report.createdBy}${report.shopName ? `, ${report.shopName}` : ''}` : 'Saved';
  return (
    <article aria-label={`Fit report: ${report.title}`}>
      <CompatResultView
        result={report.result}
        heading={
          <header className="mb-1 border-b border-ink/10 pb-2">
            <div className="flex flex-wrap items-start justify-between gap-x-6 gap-y-1">
              <p className="text-xs font-semibold uppercase tracking-wide text-ink-soft">
                Fit report · {report.kind === 'coil' ? 'ignition coil' : 'spark plug'}
              </p>
              <address aria-label="Store" className="text-right text-sm not-italic text-ink-soft">
                <span className="font-semibold text-ink">{report.store.name}</span>
                {report.store.phone && <> · {report.store.phone}</>}
                {report.store.address && <span className="block whitespace-pre-line">{report.store.address}</span>}
              </address>
            </div>
            <h2 className="text-xl font-semibold text-ink">{report.title}</h2>
            {report.vehicle && <p className="text-[15px] font-medium text-ink">Vehicle: {vehicleText(report.vehicle)}</p>}
            <p className="text-sm text-ink-soft">
              {by} on <time dateTime={report.createdAt}>{formatDateTime(report.createdAt)}</time>
            </p>
            {report.prices.length > 0 && (
              <ul aria-label="Prices" className="mt-1 text-[15px] text-ink">
                {report.prices.map((p) => (
                  <li key={p.side}>
                    {p.side === 'original' ? 'Original' : 'Substitute'} {p.label}: {formatMoney(p.listCents)}
                    {p.coreCents > 0 && <span className="text-ink-soft"> + {formatMoney(p.coreCents)} core charge</span>}
                  </li>
                ))}
              </ul>
            )}
            {report.notes && <p className="mt-1 whitespace-pre-wrap text-[15px] text-ink">{report.notes}</p>}
          </header>
        }
      />
    </article>
  );
}
