import type { CheckRow } from '@shared/schemas/compat';
import { checkLabel } from './check-labels';
import { formatFigure } from '@shared/format';
import { VerdictBadge } from './verdict-badge';

const ROW_TINT = {
  go: '',
  review: 'bg-review-soft/35',
  'no-go': 'bg-nogo-soft/45',
} as const;

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
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left text-[15px]">
        <caption className="sr-only">
          Checks of {substituteLabel} against {originalLabel}
        </caption>
        <thead>
          <tr className="border-b-2 border-ink/15 text-xs font-semibold uppercase tracking-wide text-ink-soft">
            <th scope="col" className="py-2 pr-3">
              Check
            </th>
            <th scope="col" className="py-2 pr-3">
              Verdict
            </th>
            <th scope="col" className="py-2 pr-3">
              <span className="block">Original</span>
              <span className="block font-normal normal-case tracking-normal text-ink-faint">{originalLabel}</span>
            </th>
            <th scope="col" className="py-2 pr-3">
              <span className="block">Substitute</span>
              <span className="block font-normal normal-case tracking-normal text-ink-faint">{substituteLabel}</span>
            </th>
            <th scope="col" className="py-2">
              Reason
            </th>
          </tr>
        </thead>
        <tbody>
          {checks.map((c) => (
            <tr key={c.id} data-check={c.id} className={`border-b border-ink/10 align-top print:bg-transparent ${ROW_TINT[c.verdict]}`}>
              <th scope="row" className="py-2 pr-3 font-semibold whitespace-nowrap text-ink">
                {checkLabel(c.id)}
              </th>
              <td className="py-2 pr-3">
                <VerdictBadge verdict={c.verdict} />
              </td>
              <td className="py-2 pr-3 tabular-nums whitespace-nowrap">{formatFigure(c.original, c.unit)}</td>
              <td className="py-2 pr-3 font-medium tabular-nums whitespace-nowrap">{formatFigure(c.substitute, c.unit)}</td>
              <td className="min-w-[18rem] py-2 leading-snug text-ink-soft">{c.reason}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
