import { Link } from 'react-router-dom';
import { VerdictBadge } from '@/features/compat/components/verdict-badge';
import type { FitReportSummary } from '@shared/schemas/fit-reports';
import { formatDateTime } from '@shared/format';

const KIND_LABEL = { coil: 'coil', plug: 'plug' } as const;

export function FitReportList({ reports }: { reports: readonly FitReportSummary[] }) {
  if (reports.length === 0) return <p className="text-ink-soft">No fit reports yet. Save one from Compare.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left text-[15px]">
        <thead>
          <tr className="border-b-2 border-ink/15 text-xs font-semibold uppercase tracking-wide text-ink-soft">
            <th scope="col" className="py-2 pr-3">
              Title
            </th>
            <th scope="col" className="py-2 pr-3">
              Kind
            </th>
            <th scope="col" className="py-2 pr-3">
              Verdict
            </th>
            <th scope="col" className="py-2 pr-3">
              Saved by
            </th>
            <th scope="col" className="py-2 pr-3">
              Shop
            </th>
            <th scope="col" className="py-2">
              When
            </th>
          </tr>
        </thead>
        <tbody>
          {reports.map((r) => (
            <tr key={r.id} className="border-b border-ink/10">
              <td className="py-2 pr-3">
                <Link to={`/fit-reports/${r.id}`} className="font-medium text-accent underline-offset-2 hover:underline">
                  {r.title}
                </Link>
              </td>
              <td className="py-2 pr-3 text-ink-soft">{KIND_LABEL[r.kind]}</td>
              <td className="py-2 pr-3">
                <VerdictBadge verdict={r.verdict} />
              </td>
              <td className="py-2 pr-3">{r.createdBy}</td>
              <td className="py-2 pr-3 text-ink-soft">{r.shopName ?? 'the store'}</td>
              <td className="py-2 whitespace-nowrap text-ink-soft">
                <time dateTime={r.createdAt}>{formatDateTime(r.createdAt)}</time>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
