import type { ReactNode } from 'react';
import type { PartDetail, PartSummary } from '@shared/schemas/parts';
import { ErrorNote } from '@/components/ui/panel';
import { Sheet } from '@/components/ui/sheet';
import { sellPriceReasonText } from '@shared/schemas/sell-price';
import { usePart } from '../api/get-part';
import { InterchangeList } from './interchange-list';
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

const KIND_NAME = { coil: 'Ignition coil', plug: 'Spark plug' } as const;

export interface PartSheetProps {
  /** The part shown; null keeps the sheet closed. */
  partId: string | null;
  engineId: string | null;
  /** What the clerk searched for, to mark the interchange row it matched. */
  typed: string;
  /** The verdict section, composed by the page (it judges the part on the picked vehicle's engine). */
  verdict: (part: PartSummary) => ReactNode;
  onOpenPart: (id: string) => void;
  onClose: () => void;
  /** Under the stock line, composed by the page: what the reader may do about the stock (ask another store). */
  stockActions?: (detail: PartDetail) => ReactNode;
}

/**
 * One part in full, in the kit's Sheet (from the bottom on a phone, from the right on a wide
 * screen, always in view): price and stock first (what the customer asks), then the verdict, the
 * spec, its interchange numbers, its supersession chain and each supplier's prices. A part
 * opened from inside (an alternate, a chain link) replaces it in the same sheet.
 */
export function PartSheet({ partId, engineId, typed, verdict, onOpenPart, onClose, stockActions }: PartSheetProps) {
  const detail = usePart(partId, engineId);
  const part = detail.data?.part;
  return (
    <Sheet
      open={partId !== null}
      onOpenChange={(open) => !open && onClose()}
      title={part ? `${KIND_NAME[part.kind]} · ${part.brand}` : 'Part'}
    >
      {detail.isPending && <p className="text-ink-faint">Loading the part…</p>}
      <ErrorNote error={detail.error} />
      {detail.data && (
        <PartDetailBody
          detail={detail.data}
          engineId={engineId}
          typed={typed}
          verdict={verdict}
          onOpenPart={onOpenPart}
          stockActions={stockActions}
        />
      )}
    </Sheet>
  );
}

function PartDetailBody({
  detail,
  engineId,
  typed,
  verdict,
  onOpenPart,
  stockActions,
}: Pick<PartSheetProps, 'engineId' | 'typed' | 'verdict' | 'onOpenPart' | 'stockActions'> & { detail: PartDetail }) {
  const { part, spec, interchange, supersession, stock, price, prices, sellPriceBasis } = detail;
  const superseded = supersession.current.id !== part.id;
  return (
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
      {stockActions?.(detail)}
      <Section title="Verdict">{verdict(part)}</Section>
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
  );
}
