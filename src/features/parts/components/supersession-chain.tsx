import type { Supersession } from '@shared/schemas/parts';
import type { PartRef } from '@shared/schemas/parts';

function PartButton({ part, onOpenPart, current }: { part: PartRef; onOpenPart: (id: string) => void; current: boolean }) {
  if (current) return <span className="font-mono font-semibold">{part.partNumber} (this part)</span>;
  return (
    <button
      type="button"
      onClick={() => onOpenPart(part.id)}
      className="font-mono font-semibold text-accent-strong underline underline-offset-2"
    >
      {part.partNumber}
    </button>
  );
}

/** What this part replaced, what replaced it, and the part to sell now; each opens in the panel. */
export function SupersessionChain({
  chain,
  partId,
  onOpenPart,
}: {
  chain: Supersession;
  partId: string;
  onOpenPart: (id: string) => void;
}) {
  if (chain.supersedes.length === 0 && chain.supersededBy === null)
    return <p className="text-ink-soft">Not part of a supersession chain.</p>;
  const list = (parts: PartRef[]) =>
    parts.map((p, i) => (
      <span key={p.id}>
        {i > 0 && ', '}
        <PartButton part={p} onOpenPart={onOpenPart} current={p.id === partId} />
      </span>
    ));
  return (
    <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-[15px]">
      <dt className="text-ink-soft">Supersedes</dt>
      <dd>{chain.supersedes.length ? list(chain.supersedes) : '—'}</dd>
      <dt className="text-ink-soft">Superseded by</dt>
      <dd>{chain.supersededBy ? list([chain.supersededBy]) : '—'}</dd>
      <dt className="text-ink-soft">Current</dt>
      <dd>{list([chain.current])}</dd>
    </dl>
  );
}
