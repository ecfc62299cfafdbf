import { useId, useState } from 'react';
import { Link } from 'react-router-dom';
import type { PartKind } from '@shared/schemas/specs';
import { ErrorNote } from '@/components/ui/panel';
import { useAlternates } from '../api/get-alternates';
import type { Alternate } from '@shared/schemas/alternates';
import { compareHref } from '@/features/parts/compare-link';
import { PriceNote } from '@/features/parts/components/price-note';
import { StockNote } from '@/features/parts/components/stock-note';
import { VerdictBadge } from '@/features/compat/components/verdict-badge';

/** The checks that decided a verdict other than go, worst first: what the clerk must know. */
function deciding(alt: Alternate): string[] {
  const rank = { 'no-go': 0, review: 1, go: 2 } as const;
  return alt.checks
    .filter((c) => c.verdict !== 'go')
    .sort((a, b) => rank[a.verdict] - rank[b.verdict])
    .slice(0, 2)
    .map((c) => c.reason);
}

/**
 * An engine's alternates for one position, in the server's ranking (best verdict first), each
 * with its verdict, why, and a link to Compare it against the fitted part. No-go parts are left
 * out unless asked for: they are there to explain, not to sell.
 */
export function AlternatesList({
  engineId,
  kind,
  fittedPartId,
  onOpenPart,
}: {
  engineId: string;
  kind: PartKind;
  fittedPartId: string;
  onOpenPart: (partId: string) => void;
}) {
  const [includeNoGo, setIncludeNoGo] = useState(false);
  const alternates = useAlternates(engineId, kind, includeNoGo);
  const toggleId = useId();
  const result = alternates.data;

  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h4 className="text-sm font-semibold text-ink">Alternates, best first</h4>
        {result?.available !== false && (
          <label htmlFor={toggleId} className="flex items-center gap-2 text-sm text-ink-soft">
            <input
              id={toggleId}
              type="checkbox"
              checked={includeNoGo}
              onChange={(e) => setIncludeNoGo(e.target.checked)}
              className="h-4 w-4"
            />
            show no-go too
          </label>
        )}
      </div>
      <ErrorNote error={alternates.error} />
      {alternates.isPending && <p className="text-ink-faint">Ranking alternates…</p>}
      {result?.available === false && <p className="text-ink-soft">Ranked alternates are not available yet.</p>}
      {result?.available && result.alternates.length === 0 && (
        <p className="text-ink-soft">{includeNoGo ? 'No alternates on file for this position.' : 'No alternate passes as go or review.'}</p>
      )}
      {result?.available && result.alternates.length > 0 && (
        <ol className="flex flex-col divide-y divide-ink/10 rounded-md border border-ink/10" aria-label={`${kind} alternates`}>
          {result.alternates.map((alt) => (
            // Stacked, not in columns: on a phone the reasons keep the full width and read as sentences.
            <li key={alt.part.id} className="flex flex-col gap-1 px-3 py-2">
              <div className="flex flex-wrap items-baseline gap-x-2 gap-y-1">
                <VerdictBadge verdict={alt.verdict} />
                <button
                  type="button"
                  onClick={() => onOpenPart(alt.part.id)}
                  className="font-mono font-semibold text-accent-strong underline-offset-2 hover:underline"
                >
                  {alt.part.partNumber}
                </button>
                <span className="text-ink-soft">{alt.part.brand}</span>
                <span className="ml-auto flex flex-wrap items-baseline gap-x-3 text-sm">
                  <PriceNote price={alt.price} />
                  <StockNote stock={alt.stock} />
                  <Link
                    className="font-medium text-accent-strong underline underline-offset-2"
                    to={compareHref(fittedPartId, alt.part.id, engineId)}
                  >
                    Compare
                  </Link>
                </span>
              </div>
              <p className="truncate text-sm text-ink-soft" title={alt.part.description}>
                {alt.part.description}
              </p>
              {deciding(alt).map((reason) => (
                <p key={reason} className="text-sm text-ink">
                  {reason}
                </p>
              ))}
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
