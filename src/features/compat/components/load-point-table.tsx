import type { CompatResult } from '@shared/schemas/compat';
import { formatMeasure } from '@shared/format';
import { LOAD_POINT_LABELS } from './load-points';

type LoadPoint = CompatResult['loadPoints'][number];

/** The voltage chart's figures as a table: the exact numbers, and the chart for those who cannot see it. */
export function LoadPointTable({
  loadPoints,
  originalLoadPoints,
}: {
  loadPoints: readonly LoadPoint[];
  originalLoadPoints: readonly LoadPoint[];
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-right text-sm tabular-nums">
        <caption className="sr-only">Required and available secondary voltage at each load point</caption>
        <thead>
          <tr className="border-b border-ink/15 text-xs font-semibold uppercase tracking-wide text-ink-soft">
            <th scope="col" className="py-1.5 pr-3 text-left">
              Load
            </th>
            <th scope="col" className="py-1.5 pr-3">
              MAP
            </th>
            <th scope="col" className="py-1.5 pr-3">
              Advance
            </th>
            <th scope="col" className="py-1.5 pr-3">
              Gap (worn)
            </th>
            <th scope="col" className="py-1.5 pr-3">
              Required
            </th>
            <th scope="col" className="py-1.5 pr-3">
              Available
            </th>
            <th scope="col" className="py-1.5 pr-3">
              Reserve
            </th>
            <th scope="col" className="py-1.5 text-ink-faint">
              Original&rsquo;s reserve
            </th>
          </tr>
        </thead>
        <tbody>
          {loadPoints.map((p) => {
            const o = originalLoadPoints.find((q) => q.name === p.name);
            return (
              <tr key={p.name} className="border-b border-ink/10">
                <th scope="row" className="py-1.5 pr-3 text-left font-semibold text-ink">
                  {LOAD_POINT_LABELS[p.name]}
                </th>
                <td className="py-1.5 pr-3">{formatMeasure(p.mapKpa, 'kPa')}</td>
                <td className="py-1.5 pr-3">{formatMeasure(p.advanceDeg, '°')}</td>
                <td className="py-1.5 pr-3">{formatMeasure(p.gapMm, 'mm')}</td>
                <td className="py-1.5 pr-3">{formatMeasure(p.requiredKv, 'kV')}</td>
                <td className="py-1.5 pr-3">{formatMeasure(p.availableKv, 'kV')}</td>
                <td className={`py-1.5 pr-3 font-semibold ${p.reservePct < 0 ? 'text-nogo' : 'text-ink'}`}>
                  {formatMeasure(p.reservePct, '%')}
                </td>
                <td className="py-1.5 text-ink-soft">{o ? formatMeasure(o.reservePct, '%') : '—'}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
