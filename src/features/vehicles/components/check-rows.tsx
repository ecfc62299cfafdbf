import type { CheckRow } from '@shared/schemas/compat';
import { checkLabel } from '@/features/compat/components/check-labels';
import { formatFigure } from '@shared/format';
import { VerdictBadge } from '@/features/compat/components/verdict-badge';

/**
 * A verdict's checks for the narrow part panel: each check that is not go with both figures and
 * its reason, then the checks that pass on one line. Compare shows every row in full width.
 */
export function CheckRows({ checks, originalLabel }: { checks: CheckRow[]; originalLabel: string }) {
  const concerns = checks.filter((c) => c.verdict !== 'go');
  const passed = checks.filter((c) => c.verdict === 'go');
  return (
    <div className="flex flex-col gap-2 text-[15px]">
      {concerns.length > 0 && (
        <ul className="flex flex-col gap-2" aria-label="Checks that need attention">
          {concerns.map((c) => (
            <li key={c.id} className="flex flex-col gap-0.5">
              <span className="flex flex-wrap items-center gap-2">
                <VerdictBadge verdict={c.verdict} />
                <span className="font-medium">{checkLabel(c.id)}</span>
              </span>
              <span className="text-sm text-ink-soft">
                {originalLabel}: <span className="text-ink">{formatFigure(c.original, c.unit)}</span> · this part:{' '}
                <span className="text-ink">{formatFigure(c.substitute, c.unit)}</span>
              </span>
              <span className="text-sm">{c.reason}</span>
            </li>
          ))}
        </ul>
      )}
      {passed.length > 0 && (
        <p className="flex flex-wrap items-center gap-2 text-sm text-ink-soft">
          <VerdictBadge verdict="go" />
          {passed.map((c) => checkLabel(c.id)).join(', ')}
        </p>
      )}
    </div>
  );
}
