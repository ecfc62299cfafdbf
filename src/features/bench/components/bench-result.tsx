import { StatusBadge, type Verdict } from '@/features/compat/components/verdict-badge';
import { formatMeasure, formatRange } from '@shared/format';
import type { BenchVerdict } from '@shared/compat/bench-test';
import type { BenchResult } from '@shared/schemas/bench';

/** A bench verdict's word and the verdict look it takes: only "in spec" is good to fit. */
export const BENCH_LOOK: Record<BenchVerdict, { tone: Verdict; label: string }> = {
  'in-spec': { tone: 'go', label: 'in spec' },
  'out-of-spec': { tone: 'no-go', label: 'out of spec' },
  short: { tone: 'no-go', label: 'short' },
  open: { tone: 'no-go', label: 'open' },
};

function BenchBadge({ verdict, size }: { verdict: BenchVerdict; size?: 'sm' | 'lg' }) {
  const look = BENCH_LOOK[verdict];
  return <StatusBadge tone={look.tone} label={look.label} size={size} />;
}

export interface Readings {
  primaryOhm: number | null;
  secondaryKohm: number | null | undefined;
  temperatureC: number;
}

/** The readings corrected to 20 °C against the coil's windows, with the verdict and its reason. */
export function BenchResultView({ result, readings }: { result: BenchResult; readings: Readings }) {
  const w = result.window;
  const secondaryWindow =
    w.secondaryKohmMin != null && w.secondaryKohmMax != null ? formatRange(w.secondaryKohmMin, w.secondaryKohmMax, 'kΩ') : null;
  const reading = (v: number | null | undefined, unit: string) =>
    v === undefined ? 'not measured' : v === null ? 'no reading' : formatMeasure(v, unit, 3);
  return (
    <div className="flex flex-col gap-3" aria-label="Bench test result" role="region">
      <div className="flex flex-wrap items-center gap-3">
        <span className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Verdict</span>
        <span data-testid="bench-verdict">
          <BenchBadge verdict={result.verdict} size="lg" />
        </span>
        {result.coil && <span className="text-ink-soft">{result.coil.label}</span>}
      </div>
      <p className="text-[16px] leading-snug text-ink">{result.reason}</p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-left text-[15px] tabular-nums">
          <thead>
            <tr className="border-b-2 border-ink/15 text-xs font-semibold uppercase tracking-wide text-ink-soft">
              <th scope="col" className="py-2 pr-3">
                Winding
              </th>
              <th scope="col" className="py-2 pr-3">
                Reading at {formatMeasure(readings.temperatureC, '°C')}
              </th>
              <th scope="col" className="py-2 pr-3">
                Corrected to 20&nbsp;°C
              </th>
              <th scope="col" className="py-2 pr-3">
                Window at 20&nbsp;°C
              </th>
              <th scope="col" className="py-2">
                Verdict
              </th>
            </tr>
          </thead>
          <tbody>
            <tr className="border-b border-ink/10">
              <th scope="row" className="py-2 pr-3 font-semibold">
                Primary
              </th>
              <td className="py-2 pr-3">{reading(readings.primaryOhm, 'Ω')}</td>
              <td className="py-2 pr-3 font-semibold">
                {result.primaryAt20Ohm === null ? '—' : formatMeasure(result.primaryAt20Ohm, 'Ω', 3)}
              </td>
              <td className="py-2 pr-3">{formatRange(w.primaryOhmMin, w.primaryOhmMax, 'Ω')}</td>
              <td className="py-2">
                <BenchBadge verdict={result.primaryVerdict} />
              </td>
            </tr>
            {readings.secondaryKohm !== undefined && (
              <tr className="border-b border-ink/10">
                <th scope="row" className="py-2 pr-3 font-semibold">
                  Secondary
                </th>
                <td className="py-2 pr-3">{reading(readings.secondaryKohm, 'kΩ')}</td>
                <td className="py-2 pr-3 font-semibold">
                  {result.secondaryAt20Kohm === null ? '—' : formatMeasure(result.secondaryAt20Kohm, 'kΩ', 2)}
                </td>
                <td className="py-2 pr-3">{secondaryWindow ?? 'not stated'}</td>
                <td className="py-2">
                  {result.secondaryVerdict ? (
                    <BenchBadge verdict={result.secondaryVerdict} />
                  ) : (
                    <span className="text-ink-soft">no window</span>
                  )}
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}
