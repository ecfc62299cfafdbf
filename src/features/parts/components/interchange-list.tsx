import { Link } from 'react-router-dom';
import { normalizePartNumber } from '@shared/part-number';
import { checkLabel } from '@/features/compat/components/check-labels';
import { VerdictBadge } from '@/features/compat/components/verdict-badge';
import type { InterchangeRow } from '@shared/schemas/parts';
import { compareHref } from '../compare-link';
import { formatPercent } from '@shared/format';

/**
 * The foreign numbers this part stands in for, where each claim came from, and the verdict of
 * the foreign part's own spec against ours: a cross-reference row alone never says why two parts
 * are equivalent, and some rows are wrong. The number the clerk typed is marked.
 */
export function InterchangeList({
  rows,
  partId,
  engineId,
  typed,
}: {
  rows: InterchangeRow[];
  partId: string;
  engineId: string | null;
  typed: string;
}) {
  if (rows.length === 0) return <p className="text-ink-soft">No interchange numbers on file.</p>;
  const typedNorm = normalizePartNumber(typed);
  return (
    <ul className="flex flex-col divide-y divide-ink/10 text-[15px]" aria-label="Interchange numbers">
      {rows.map((r) => {
        const isTyped = typedNorm.length >= 3 && normalizePartNumber(r.number) === typedNorm;
        return (
          <li key={r.id} className={`flex flex-col gap-0.5 px-1 py-1.5 ${isTyped ? 'bg-accent-soft' : ''}`}>
            <div className="flex flex-wrap items-center gap-x-2">
              {r.check ? <VerdictBadge verdict={r.check.verdict} /> : <span className="text-sm text-ink-faint">not judged</span>}
              <span>{r.brand}</span>
              <span className="font-mono font-semibold whitespace-nowrap">{r.number}</span>
              {isTyped && <span className="text-xs font-semibold text-accent-strong">(typed)</span>}
              {r.originalPartId && (
                <Link
                  className="ml-auto text-sm font-medium text-accent-strong underline underline-offset-2"
                  to={compareHref(r.originalPartId, partId, engineId)}
                >
                  Compare
                </Link>
              )}
            </div>
            <p className="text-sm text-ink-soft">
              {r.source}, {formatPercent(r.confidence * 100)} sure
              {r.check && ` · judged on ${r.check.engine}`}
            </p>
            {r.check?.concerns.map((c) => (
              <p key={c.id} className="text-sm text-ink">
                {checkLabel(c.id)}: {c.reason}
              </p>
            ))}
          </li>
        );
      })}
    </ul>
  );
}
