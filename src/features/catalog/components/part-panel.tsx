import type { ReactNode } from 'react';
import { ErrorNote, Panel } from '@/components/ui/panel';
import { usePart } from '../api/get-part';
import { InterchangeList } from './interchange-list';
import { PartVerdict } from './part-verdict';
import { sellPriceReasonText } from '@shared/schemas/sell-price';
import { PriceNote } from './price-note';
import { SpecList } from './spec-list';
import { StockNote } from './stock-note';
import { SupersessionChain } from './supersession-chain';
import { SupplierPrices } from './supplier-prices';

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="flex flex-col gap-1.5 border-t border-ink/10 pt-3">
      <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-soft">{title}</h3>
      {children}
    </section>
  );
}

/**
 * One part in full: price and stock first (what the customer asks), then the verdict, the spec,
 * its interchange numbers, its supersession chain and each supplier's prices.
 */
export function PartPanel({
  partId,
  engineId,
  typed,
  onOpenPart,
  onClose,
}: {
  partId: string;
  engineId: string | null;
  /** What the clerk searched for, to mark the interchange row it matched. */
  typed: string;
  onOpenPart: (id: string) => void;
  onClose: () => void;
}) {
  const detail = usePart(partId, engineId);
  const close = (
    <button type="button" onClick={onClose} className="rounded px-2 py-0.5 text-sm text-ink-soft hover:bg-paper-sunk">
      Close
    </button>
  );
  if (detail.isPending) {
    return (
      <Panel title="Part" actions={close}>
        <p className="text-ink-faint">Loading the part…</p>
      </Panel>
    );
  }
  if (detail.error) {
    return (
      <Panel title="Part" actions={close}>
        <ErrorNote error={detail.error} />
      </Panel>
    );
  }
  const { part, spec, interchange, supersession, stock, price, prices, sellPriceBasis } = detail.data;
  const superseded = supersession.current.id !== part.id;
  return (
    <Panel title={`${part.kind === 'coil' ? 'Ignition coil' : 'Spark plug'} · ${part.brand}`} actions={close}>
      <div className="flex flex-col gap-3" aria-label={`Part ${part.partNumber}`} role="region">
        <div>
          <p className="font-mono text-2xl font-semibold tracking-tight text-ink">{part.partNumber}</p>
          <p className="text-[15px] text-ink">{part.description}</p>
          {part.gtin && <p className="text-sm text-ink-faint">GTIN {part.gtin}</p>}
          {part.status === 'discontinued' && <p className="mt-1 font-medium text-nogo">Discontinued</p>}
          {superseded && (
            <p className="mt-2 rounded-md border border-review/40 bg-review-soft px-2 py-1 text-[15px] text-ink">
              Superseded: sell{' '}
              <button
                type="button"
                onClick={() => onOpenPart(supersession.current.id)}
                className="font-mono font-semibold text-accent-strong underline underline-offset-2"
              >
                {supersession.current.partNumber}
              </button>{' '}
              instead.
            </p>
          )}
        </div>
        <div className="flex flex-wrap items-baseline justify-between gap-2 rounded-md bg-paper-sunk px-3 py-2">
          <PriceNote price={price} large />
          <StockNote stock={stock} />
          {sellPriceBasis && (
            <p className="basis-full text-sm text-ink-soft">
              {sellPriceBasis.supplier}’s price · {sellPriceReasonText(sellPriceBasis)}
            </p>
          )}
        </div>
        <Section title="Verdict">
          <PartVerdict part={part} engineId={engineId} onOpenPart={onOpenPart} />
        </Section>
        <Section title="Spec">{spec ? <SpecList spec={spec} /> : <p className="text-ink-soft">No spec on file.</p>}</Section>
        <Section title="Interchange">
          <InterchangeList rows={interchange} partId={part.id} engineId={engineId} typed={typed} />
        </Section>
        <Section title="Supersession">
          <SupersessionChain chain={supersession} partId={part.id} onOpenPart={onOpenPart} />
        </Section>
        <Section title="Supplier prices">
          <SupplierPrices prices={prices} />
        </Section>
      </div>
    </Panel>
  );
}
