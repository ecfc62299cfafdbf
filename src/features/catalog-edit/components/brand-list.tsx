import type { Brand } from '@shared/schemas/brands';
import { HeatScale, ScaleEnds } from './heat-scale';

/** The brands on file, our lines first, each with its heat table on the store's scale. */
export function BrandList({ brands }: { brands: readonly Brand[] }) {
  if (brands.length === 0) return <p className="text-ink-soft">No brands yet. Add the first one.</p>;
  return (
    <div className="flex flex-col gap-2">
      <div className="grid gap-x-6 border-b border-ink/10 pb-1 lg:grid-cols-[14rem_minmax(0,1fr)]">
        <span className="text-xs font-semibold tracking-wide text-ink-soft uppercase">Brand</span>
        <div className="flex flex-col">
          <span className="text-xs font-semibold tracking-wide text-ink-soft uppercase">Heat codes on the heat-step scale</span>
          <ScaleEnds />
        </div>
      </div>
      <ul aria-label="Brands" className="flex flex-col divide-y divide-ink/10">
        {brands.map((b) => (
          <li key={b.id} aria-label={b.name} className="grid gap-x-6 gap-y-1 py-2.5 last:pb-0 lg:grid-cols-[14rem_minmax(0,1fr)]">
            <div>
              <p className="text-[17px] font-semibold text-ink">{b.name}</p>
              <p className="text-sm text-ink-soft">
                {b.ours ? <span className="font-medium text-accent-strong">our line</span> : 'another maker'}
                {' · '}
                {b.heatCodes.length ? `${b.heatCodes.length} heat codes` : 'no heat table'}
              </p>
            </div>
            <div className="flex flex-col gap-1">
              {b.heatCodeNote && <p className="text-[15px] text-ink">{b.heatCodeNote}</p>}
              {b.heatCodes.length > 0 ? (
                <HeatScale compact codes={b.heatCodes} label={`${b.name} heat codes on the heat-step scale`} />
              ) : (
                <p className="text-sm text-ink-faint">No heat codes: enough for coils, but a plug of this brand cannot be given a spec.</p>
              )}
            </div>
          </li>
        ))}
      </ul>
    </div>
  );
}
