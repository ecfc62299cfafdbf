import type { CompatResult } from '@shared/schemas/compat';
import { CompatResultView } from '@/features/compat/components/compat-result-view';
import { ErrorNote } from '@/components/ui/panel';

/**
 * What the comparison came to: a prompt while something is missing, the API's message when the
 * inputs were refused (those naming a side are shown by that side instead), else the result.
 */
export function ComparisonOutcome({
  ready,
  outOfDate,
  pending,
  error,
  errorShownBySide,
  result,
}: {
  ready: boolean;
  /** A typed-in spec was edited since it was used: no verdict is current. */
  outOfDate: boolean;
  pending: boolean;
  error: Error | null;
  errorShownBySide: boolean;
  result: CompatResult | undefined;
}) {
  if (!ready) {
    return (
      <p className="rounded-lg border border-dashed border-ink/25 px-4 py-6 text-center text-ink-soft">
        Choose the engine, the original and the substitute to see the verdict.
      </p>
    );
  }
  if (outOfDate) {
    return (
      <p
        role="status"
        data-testid="compare-out-of-date"
        className="rounded-lg border border-review/40 bg-review-soft px-4 py-3 text-review"
      >
        The typed-in spec changed since it was used: press Use this spec for a verdict on what is shown.
      </p>
    );
  }
  if (error) {
    return errorShownBySide ? (
      <p role="alert" className="rounded-lg border border-nogo/30 bg-nogo-soft px-4 py-3 text-nogo">
        No verdict: fix the input marked above.
      </p>
    ) : (
      <ErrorNote error={error} />
    );
  }
  if (pending || !result) return <p className="px-1 py-4 text-ink-soft">Working out the verdict…</p>;
  return <CompatResultView result={result} />;
}
