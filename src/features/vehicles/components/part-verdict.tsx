import { Link } from 'react-router-dom';
import type { PartSummary } from '@shared/schemas/parts';
import { ErrorNote } from '@/components/ui/panel';
import { useAlternates } from '../api/get-alternates';
import { useEngine } from '../api/get-engine';
import type { Fitment } from '@shared/schemas/vehicles';
import { compareHref } from '@/features/parts/compare-link';
import { AlternatesList } from './alternates-list';
import { CheckRows } from './check-rows';
import { VerdictBadge } from '@/features/compat/components/verdict-badge';

export const NO_SPEC_NOTE = 'no spec — no verdict';

/** This part judged against the part the engine is fitted with, from the engine's ranking. */
function VerdictAgainstFitted({
  part,
  fitted,
  engineId,
  engineCode,
}: {
  part: PartSummary;
  fitted: Fitment;
  engineId: string;
  engineCode: string;
}) {
  const ranking = useAlternates(engineId, part.kind, true);
  const compare = (
    <Link className="font-medium text-accent-strong underline underline-offset-2" to={compareHref(fitted.part.id, part.id, engineId)}>
      Compare with {fitted.part.partNumber}
    </Link>
  );
  if (ranking.isPending) return <p className="text-ink-faint">Judging against {fitted.part.partNumber}…</p>;
  if (ranking.error) return <ErrorNote error={ranking.error} />;
  if (!ranking.data.available) {
    return <p className="text-ink-soft">Verdicts are not available yet. {compare}</p>;
  }
  const alt = ranking.data.alternates.find((a) => a.part.id === part.id);
  if (!alt) {
    return (
      <p className="text-ink-soft">
        Not ranked as an alternate to {fitted.part.partNumber} on {engineCode}. {compare}
      </p>
    );
  }
  return (
    <div className="flex flex-col gap-2">
      <p className="flex flex-wrap items-center gap-2">
        <VerdictBadge verdict={alt.verdict} />
        <span>
          in place of <span className="font-mono font-semibold">{fitted.part.partNumber}</span> on {engineCode}
        </span>
        <span className="ml-auto">{compare}</span>
      </p>
      <CheckRows checks={alt.checks} originalLabel={fitted.part.partNumber} />
    </div>
  );
}

/**
 * The verdict part of the panel: with an engine chosen, either the fitted part's ranked
 * alternates or this part's own verdict against the fitted one; without one, what to do next.
 */
export function PartVerdict({
  part,
  engineId,
  onOpenPart,
}: {
  part: PartSummary;
  engineId: string | null;
  onOpenPart: (id: string) => void;
}) {
  const engine = useEngine(engineId);
  if (!part.hasSpec) return <p className="font-medium text-review">{NO_SPEC_NOTE}</p>;
  if (engineId === null) return <p className="text-ink-soft">Pick a vehicle to see this part judged against what its engine takes.</p>;
  if (engine.isPending) return <p className="text-ink-faint">Loading the engine…</p>;
  if (engine.error) return <ErrorNote error={engine.error} />;
  const { code } = engine.data.engine;
  const fitted = engine.data.fitments.find((f) => f.part.kind === part.kind);
  if (!fitted)
    return (
      <p className="text-ink-soft">
        {code} has no {part.kind} on file to judge against.
      </p>
    );
  if (fitted.part.id === part.id) {
    return (
      <div className="flex flex-col gap-2">
        <p>
          The part {code} is fitted with, {fitted.quantity} per engine.
        </p>
        {/* Folded: the same list stands open under the vehicle, and the spec matters more here. */}
        <details className="rounded-md border border-ink/10 px-2 py-1">
          <summary className="cursor-pointer py-1 font-medium text-accent-strong">Ranked alternates on {code}</summary>
          <div className="pb-2">
            <AlternatesList engineId={engineId} kind={part.kind} fittedPartId={part.id} onOpenPart={onOpenPart} />
          </div>
        </details>
      </div>
    );
  }
  return <VerdictAgainstFitted part={part} fitted={fitted} engineId={engineId} engineCode={code} />;
}
