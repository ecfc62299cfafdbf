import type { ReactNode } from 'react';
import type { CompatResult } from '@shared/schemas/compat';
import { Cautions } from './cautions';
import { CheckTable } from './check-table';
import { CurrentChart } from './current-chart';
import { formatMeasure } from '@shared/format';
import { LoadPointTable } from './load-point-table';
import { VerdictBadge } from './verdict-badge';
import { VoltageChart } from './voltage-chart';

const VERDICT_SENTENCE = {
  go: 'The substitute meets the original on every check.',
  review: 'The substitute can work, but at least one check needs a person to decide.',
  'no-go': 'Do not fit: at least one check fails.',
} as const;

function Section({ title, children, className = '' }: { title: string; children: ReactNode; className?: string }) {
  return (
    <section className={`print-block rounded-lg border border-ink/10 bg-paper-raised p-4 shadow-sm print:shadow-none ${className}`}>
      <h2 className="mb-3 text-base font-semibold text-ink">{title}</h2>
      {children}
    </section>
  );
}

function VerdictCounts({ checks }: { checks: CompatResult['checks'] }) {
  const count = (v: CompatResult['verdict']) => checks.filter((c) => c.verdict === v).length;
  return (
    <p className="text-sm text-ink-soft">
      {checks.length} checks: {count('go')} go · {count('review')} review · {count('no-go')} no-go
    </p>
  );
}

/**
 * A comparison as a whole: the overall verdict, the check table, both charts (the current chart
 * for coils only), the load-point figures and the cautions. Compare, the fit report and its
 * shared read-only view all show a result through this one component.
 */
export function CompatResultView({ result, heading }: { result: CompatResult; heading?: ReactNode }) {
  const isCoil = result.kind === 'coil';
  return (
    <div className="flex flex-col gap-4">
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,26rem)]">
        <section
          aria-label="Overall verdict"
          className="print-block flex flex-col gap-2 rounded-lg border border-ink/10 bg-paper-raised p-4 shadow-sm print:shadow-none"
        >
          {heading}
          <div className="flex flex-wrap items-center gap-3">
            <span className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Overall verdict</span>
            <span data-testid="overall-verdict">
              <VerdictBadge verdict={result.verdict} size="lg" />
            </span>
          </div>
          <p className="text-[17px] font-medium text-ink">{VERDICT_SENTENCE[result.verdict]}</p>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-[15px]">
            <dt className="text-ink-soft">Substitute</dt>
            <dd className="font-semibold text-ink">{result.substitute.label}</dd>
            <dt className="text-ink-soft">Original</dt>
            <dd className="text-ink">{result.original.label}</dd>
            <dt className="text-ink-soft">Engine</dt>
            <dd className="text-ink">{result.engine.label}</dd>
            {result.energyMj && (
              <>
                <dt className="text-ink-soft">Energy at cranking</dt>
                <dd className="text-ink tabular-nums">
                  {formatMeasure(result.energyMj.substitute, 'mJ')} against {formatMeasure(result.energyMj.original, 'mJ')}
                </dd>
              </>
            )}
          </dl>
          <VerdictCounts checks={result.checks} />
        </section>
        <Cautions cautions={result.cautions.length ? result.cautions : undefined} />
      </div>

      <Section title={isCoil ? 'Coil checks' : 'Plug checks'}>
        <CheckTable checks={result.checks} originalLabel={result.original.label} substituteLabel={result.substitute.label} />
      </Section>

      <div className={`grid grid-cols-[minmax(0,1fr)] gap-4 ${isCoil ? 'xl:grid-cols-2' : ''} print:grid-cols-1`}>
        {isCoil && result.currents && result.crankingCurrents && (
          <Section title="Primary current rise">
            <CurrentChart
              currents={result.currents}
              crankingCurrents={result.crankingCurrents}
              driverLimitA={result.driverLimitA}
              dwellMs={result.dwellMs}
              crankingDwellMs={result.crankingDwellMs}
            />
          </Section>
        )}
        <Section title="Required and available secondary voltage">
          <VoltageChart loadPoints={result.loadPoints} originalLoadPoints={result.originalLoadPoints} />
          <div className="mt-3">
            <LoadPointTable loadPoints={result.loadPoints} originalLoadPoints={result.originalLoadPoints} />
          </div>
        </Section>
      </div>
    </div>
  );
}
