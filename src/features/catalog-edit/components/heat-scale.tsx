import { HEAT_STEP_MAX, HEAT_STEP_MIN } from '@shared/schemas/specs';
import { codesByStep, directionWords, heatDirection, type HeatCode } from '../heat-table';

/** The two ends of the heat-step scale, over a strip or a column of strips. */
export function ScaleEnds() {
  return (
    <div className="flex justify-between text-xs text-ink-faint">
      <span>← step {HEAT_STEP_MIN}, hottest</span>
      <span>coldest, step {HEAT_STEP_MAX} →</span>
    </div>
  );
}

/**
 * A brand's heat codes laid on the store's heat-step scale, hottest on the left: two brands'
 * tables read side by side even when their codes run opposite ways.
 */
export function HeatScale({
  codes,
  label,
  compact = false,
}: {
  codes: readonly HeatCode[];
  label: string;
  /** In a list whose header already names the ends of the scale. */
  compact?: boolean;
}) {
  const steps = codesByStep(codes);
  const direction = heatDirection(codes);
  return (
    <div className="flex flex-col gap-1">
      {!compact && <ScaleEnds />}
      <ol aria-label={label} className="grid grid-cols-15 overflow-hidden rounded border border-ink/15">
        {steps.map(({ step, codes: onStep }) => (
          <li
            key={step}
            aria-label={`step ${step}: ${onStep.length ? `code ${onStep.join(', ')}` : 'no code'}`}
            className={`flex min-h-11 flex-col items-center border-r border-ink/10 px-0.5 py-0.5 last:border-r-0 ${onStep.length ? 'bg-accent-soft' : 'bg-paper'}`}
          >
            {/* ink-faint keeps 4.5:1 only on the paper colours, not on the accent's tint. */}
            <span className={`text-[11px] leading-4 tabular-nums ${onStep.length ? 'text-ink-soft' : 'text-ink-faint'}`}>{step}</span>
            <span className="font-mono text-sm leading-5 font-semibold break-all text-ink">{onStep.join(' ')}</span>
          </li>
        ))}
      </ol>
      {(!compact || direction) && (
        <p className="text-xs text-ink-faint">
          {!compact && `Heat step ${HEAT_STEP_MIN} is the hottest plug, ${HEAT_STEP_MAX} the coldest. `}
          {direction && (
            <span className={direction.nextIs === 'mixed' ? 'text-review' : 'text-ink-soft'}>
              By this table, {directionWords(direction)}.
            </span>
          )}
        </p>
      )}
    </div>
  );
}
