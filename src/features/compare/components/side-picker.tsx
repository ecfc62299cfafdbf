import { useState } from 'react';
import type { CoilSpec, PartKind, ResolvedPlugSpec } from '@shared/schemas/specs';
import { Button } from '@/components/ui/button';
import { Panel } from '@/components/ui/panel';
import { usePart } from '@/features/parts/api/get-part';
import { PartSearch } from './part-search';
import { SpecForm, type TypedSpec } from './spec-form';
import { SpecSummary } from './spec-summary';

// 'auto': the chosen part when there is one, else the search.
type Mode = 'auto' | 'search' | 'spec';

function ModeButton({ active, onClick, children }: { active: boolean; onClick: () => void; children: string }) {
  return (
    <button
      type="button"
      aria-pressed={active}
      onClick={onClick}
      className={`rounded-md px-2.5 py-1 text-sm font-medium ${active ? 'bg-accent text-white' : 'text-ink-soft hover:bg-paper-sunk'}`}
    >
      {children}
    </button>
  );
}

/**
 * One side of a comparison — the original or the substitute: a part from the catalog (searched,
 * or the engine's fitted part) or a spec typed in for a part we do not stock.
 */
export function SidePicker({
  title,
  kind,
  partId,
  typed,
  fittedPartId,
  startFrom,
  errors,
  onPickPart,
  onTypeSpec,
  onClearSpec,
  onOutOfDate,
}: {
  title: 'Original' | 'Substitute';
  kind: PartKind;
  partId: string | null;
  typed: TypedSpec | null;
  /** The engine's fitted part of this kind, offered as the original. */
  fittedPartId?: string | null;
  /** A spec to start typing from when this side has none yet (the original's, for the substitute). */
  startFrom?: CoilSpec | ResolvedPlugSpec | null;
  /** The API's messages for this side, keyed '' (the side), 'partId' or 'spec.<field>'. */
  errors: Record<string, string>;
  onPickPart: (partId: string) => void;
  onTypeSpec: (typed: TypedSpec) => void;
  /** Back to the catalog part: the typed-in spec is dropped. */
  onClearSpec: () => void;
  /** The typed-in spec on screen differs from the one in use (see SpecForm). */
  onOutOfDate: (outOfDate: boolean) => void;
}) {
  const [mode, setMode] = useState<Mode>(typed ? 'spec' : 'auto');
  const part = usePart(partId);
  const shownMode = mode === 'auto' ? (partId ? 'catalog' : 'search') : mode;
  const ownSpec = typed?.spec ?? part.data?.spec ?? null;
  const initial = ownSpec ?? startFrom ?? null;
  // The form checks the API's own schema first; what the API still refuses is shown for the side.
  const sideError = errors[''] ?? errors.partId ?? errors.spec ?? Object.entries(errors).find(([k]) => k.startsWith('spec.'))?.[1];

  const pick = (id: string) => {
    onPickPart(id);
    setMode('auto');
  };

  return (
    <Panel
      title={title}
      actions={
        <div className="flex gap-1 print:hidden" role="group" aria-label={`${title}: how to choose`}>
          <ModeButton
            active={shownMode !== 'spec'}
            onClick={() => {
              if (typed) onClearSpec();
              setMode('auto');
            }}
          >
            From the catalog
          </ModeButton>
          <ModeButton active={shownMode === 'spec'} onClick={() => setMode('spec')}>
            Type a spec
          </ModeButton>
        </div>
      }
    >
      <div className="flex flex-col gap-3" aria-label={title} role="region">
        {sideError && (
          <p role="alert" className="rounded-md border border-nogo/30 bg-nogo-soft px-3 py-2 text-sm text-nogo">
            {sideError}
          </p>
        )}
        {shownMode === 'catalog' && partId && (
          <div className="flex flex-col gap-2">
            {part.isPending && <p className="text-sm text-ink-soft">Loading the part…</p>}
            {part.isError && <p className="text-sm text-nogo">{part.error.message}</p>}
            {part.data && (
              <>
                <div className="flex flex-wrap items-baseline justify-between gap-2">
                  <p className="text-lg font-semibold text-ink" data-testid={`${title.toLowerCase()}-part`}>
                    {part.data.part.brand} {part.data.part.partNumber}
                    {fittedPartId === partId && (
                      <span className="ml-2 rounded bg-accent-soft px-1.5 py-0.5 align-middle text-xs font-semibold text-accent-strong">
                        fitted
                      </span>
                    )}
                  </p>
                  <Button variant="ghost" onClick={() => setMode('search')} className="print:hidden">
                    Change
                  </Button>
                </div>
                <p className="text-sm text-ink-soft">{part.data.part.description}</p>
                {part.data.part.kind !== kind && (
                  <p className="text-sm text-nogo">
                    This part is a {part.data.part.kind}; choose a {kind}.
                  </p>
                )}
                {part.data.spec ? (
                  <SpecSummary spec={part.data.spec} />
                ) : (
                  <p className="text-sm text-review">No spec on file for this part: it gets no verdict. Type its spec instead.</p>
                )}
              </>
            )}
          </div>
        )}
        {shownMode === 'search' && (
          <div className="flex flex-col gap-2">
            <PartSearch kind={kind} label={`Find the ${title.toLowerCase()} ${kind}`} onPick={(h) => pick(h.partId)} />
            {fittedPartId && fittedPartId !== partId && (
              <div>
                <Button variant="secondary" onClick={() => pick(fittedPartId)}>
                  Use the engine&rsquo;s fitted {kind}
                </Button>
              </div>
            )}
            {partId && (
              <div>
                <Button variant="ghost" onClick={() => setMode('auto')}>
                  Keep the current {kind}
                </Button>
              </div>
            )}
          </div>
        )}
        {shownMode === 'spec' && (
          <>
            {typed && <p className="text-sm font-medium text-go">Using this typed-in spec.</p>}
            <SpecForm
              // A new starting spec (another part picked) starts the form afresh.
              key={`${kind}-${partId ?? 'none'}`}
              name={`${title} spec`}
              kind={kind}
              initial={initial}
              applied={typed !== null}
              onSubmit={onTypeSpec}
              onOutOfDate={onOutOfDate}
            />
          </>
        )}
      </div>
    </Panel>
  );
}
