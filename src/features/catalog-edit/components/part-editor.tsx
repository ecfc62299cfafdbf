import { ErrorNote, Panel } from '@/components/ui/panel';
import { useBrands } from '../api/get-brands';
import { usePart } from '../api/get-part';
import { DetailsSection } from './details-section';
import { InterchangeSection } from './interchange-section';
import { SpecSection } from './spec-section';
import { SupersessionSection } from './supersession-section';

const KIND_WORDS = { coil: 'Ignition coil', plug: 'Spark plug' } as const;

/**
 * One part opened for editing: its details, its spec, what supersedes it and the other brands'
 * numbers that lead to it. Each block saves on its own and says what changed.
 */
export function PartEditor({ partId, onOpenPart, onClose }: { partId: string; onOpenPart: (id: string) => void; onClose: () => void }) {
  const detail = usePart(partId);
  const brands = useBrands();
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
  const { part } = detail.data;
  const brand = brands.data?.find((b) => b.name === part.brand) ?? null;
  // Each block starts from the part as loaded; a different part starts them afresh.
  const key = part.id;
  return (
    <div className="flex flex-col gap-4" role="region" aria-label={`Editing ${part.partNumber}`}>
      <Panel title={`${KIND_WORDS[part.kind]} · ${part.brand}${part.ours ? '' : ' (another maker)'}`} actions={close}>
        <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
          <p className="font-mono text-2xl font-semibold tracking-tight text-ink">{part.partNumber}</p>
          <p className="text-[15px] text-ink">{part.description || <span className="text-ink-faint">no description</span>}</p>
          <p className="ml-auto flex gap-3 text-sm">
            {part.status === 'discontinued' && <span className="font-medium text-nogo">discontinued</span>}
            {!part.hasSpec && <span className="font-medium text-review">no spec</span>}
            {part.gtin && <span className="font-mono text-ink-soft">GTIN {part.gtin}</span>}
          </p>
        </div>
      </Panel>
      <ErrorNote error={brands.error} />
      <div className="grid grid-cols-[minmax(0,1fr)] items-start gap-4 lg:grid-cols-2">
        <div className="flex flex-col gap-4">
          <DetailsSection key={`d-${key}`} detail={detail.data} />
          <SupersessionSection key={`s-${key}`} detail={detail.data} onOpenPart={onOpenPart} />
        </div>
        <SpecSection key={`p-${key}`} detail={detail.data} brand={brand} />
      </div>
      <InterchangeSection key={`i-${key}`} detail={detail.data} brands={brands.data ?? []} />
    </div>
  );
}
