import { ErrorNote } from '@/components/ui/panel';
import { useEngine } from '../api/get-engine';
import type { Fitment } from '@shared/schemas/vehicles';
import { AlternatesList } from './alternates-list';
import { EngineSummary } from './engine-summary';
import { PriceNote } from '@/features/parts/components/price-note';
import { StockNote } from '@/features/parts/components/stock-note';

function FittedPart({
  fitment,
  engineId,
  isOpen,
  onOpenPart,
}: {
  fitment: Fitment;
  engineId: string;
  isOpen: boolean;
  onOpenPart: (partId: string) => void;
}) {
  const { part } = fitment;
  return (
    <section aria-label={`Fitted ${fitment.position}`} className="flex flex-col gap-3 rounded-md border border-ink/10 p-3">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-soft">
          {fitment.position} · {fitment.quantity} per engine
        </h3>
        <PriceNote price={fitment.price} large />
      </div>
      <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <div className="min-w-0">
          <button
            type="button"
            onClick={() => onOpenPart(part.id)}
            aria-current={isOpen || undefined}
            className="font-mono text-xl font-semibold text-accent-strong underline-offset-2 hover:underline"
          >
            {part.partNumber}
          </button>
          <span className="ml-2 text-ink-soft">{part.brand}</span>
          <p className="text-[15px] text-ink">{part.description}</p>
        </div>
        <StockNote stock={fitment.stock} />
      </div>
      <AlternatesList engineId={engineId} kind={part.kind} fittedPartId={part.id} onOpenPart={onOpenPart} />
    </section>
  );
}

/** What the chosen engine takes: its figures, the fitted coil and plug, and their ranked alternates. */
export function EngineFitments({
  engineId,
  openPartId,
  onOpenPart,
}: {
  engineId: string;
  openPartId: string | null;
  onOpenPart: (partId: string) => void;
}) {
  const engine = useEngine(engineId);
  if (engine.isPending) return <p className="text-ink-faint">Loading the engine…</p>;
  if (engine.error) return <ErrorNote error={engine.error} />;
  const { fitments } = engine.data;
  return (
    <div className="flex flex-col gap-3">
      <EngineSummary engine={engine.data.engine} />
      {fitments.length === 0 && <p className="text-ink-soft">No coil or plug is on file for this engine.</p>}
      {fitments.map((f) => (
        <FittedPart key={f.part.id} fitment={f} engineId={engineId} isOpen={f.part.id === openPartId} onOpenPart={onOpenPart} />
      ))}
    </div>
  );
}
