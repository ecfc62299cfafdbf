import { useState } from 'react';
import type { SearchHit } from '@shared/schemas/search';
import { Button } from '@/components/ui/button';
import { ErrorNote } from '@/components/ui/panel';
import type { PartDetail, PartRef } from '@shared/schemas/parts';
import { useUpdatePart } from '../api/update-part';
import { partChanges, type Change } from '../changes';
import { fieldMessages, unplacedError } from '../field-messages';
import { ChangeNote } from './change-note';
import { PartFinder } from './part-finder';
import { Section } from './section';

function PartLink({ part, onOpenPart }: { part: PartRef; onOpenPart: (id: string) => void }) {
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

/**
 * Which part replaces this one. The replacement is picked by search among parts of the same kind;
 * the server still refuses a loop or a mismatch, and its reason is shown by the picker.
 */
export function SupersessionSection({ detail, onOpenPart }: { detail: PartDetail; onOpenPart: (id: string) => void }) {
  const { part, supersession } = detail;
  const [candidate, setCandidate] = useState<SearchHit | null>(null);
  const [saved, setSaved] = useState<{ changes: Change[]; at: Date } | null>(null);
  // The finder is remounted after a save so its words and hits clear.
  const [finderKey, setFinderKey] = useState(0);
  const update = useUpdatePart();
  const server = fieldMessages(update.error);
  const refusal = server.supersededById;

  const save = (supersededById: string | null) =>
    update.mutate(
      { id: part.id, body: { supersededById } },
      {
        onSuccess: (after) => {
          setCandidate(null);
          setFinderKey((k) => k + 1);
          setSaved({ changes: partChanges(detail, after), at: new Date() });
        },
      },
    );

  const current = supersession.current;
  return (
    <Section title="Supersession">
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-[15px]">
        <dt className="text-ink-soft">Superseded by</dt>
        <dd className="flex flex-wrap items-center gap-x-3">
          {supersession.supersededBy ? (
            <>
              <PartLink part={supersession.supersededBy} onOpenPart={onOpenPart} />
              <Button variant="ghost" className="!px-2 !py-0.5" disabled={update.isPending} onClick={() => save(null)}>
                Remove
              </Button>
            </>
          ) : (
            <span className="text-ink">nothing — this part is current</span>
          )}
        </dd>
        <dt className="text-ink-soft">Supersedes</dt>
        <dd>
          {supersession.supersedes.length === 0
            ? '—'
            : supersession.supersedes.map((p, i) => (
                <span key={p.id}>
                  {i > 0 && ', '}
                  <PartLink part={p} onOpenPart={onOpenPart} />
                </span>
              ))}
        </dd>
        {current.id !== part.id && current.id !== supersession.supersededBy?.id && (
          <>
            <dt className="text-ink-soft">Sell now</dt>
            <dd>
              <PartLink part={current} onOpenPart={onOpenPart} />
            </dd>
          </>
        )}
      </dl>

      <div className="flex flex-col gap-2">
        <PartFinder
          key={finderKey}
          label={supersession.supersededBy ? 'Change the replacement' : 'Set superseded by'}
          placeholder={`a ${part.kind} number or words`}
          kind={part.kind}
          exclude={part.id}
          onPick={(hit) => {
            update.reset();
            setSaved(null);
            setCandidate(hit);
          }}
        />
        {candidate && (
          <div className="flex flex-wrap items-center gap-x-3 gap-y-2 rounded-md border border-accent/30 bg-accent-soft/50 px-3 py-2 text-[15px]">
            <span>
              {part.partNumber} is replaced by{' '}
              <span className="font-mono font-semibold">
                {candidate.brand} {candidate.partNumber}
              </span>
              {candidate.description && <span className="text-ink-soft"> — {candidate.description}</span>}
            </span>
            <span className="ml-auto flex gap-2">
              <Button disabled={update.isPending} onClick={() => save(candidate.partId)}>
                {update.isPending ? 'Saving…' : 'Save supersession'}
              </Button>
              <Button
                variant="ghost"
                onClick={() => {
                  setCandidate(null);
                  update.reset();
                }}
              >
                Cancel
              </Button>
            </span>
          </div>
        )}
        {refusal && (
          <p role="alert" className="rounded-md border border-nogo/30 bg-nogo-soft px-3 py-2 text-sm text-nogo">
            Not saved: {refusal}.
          </p>
        )}
        <ErrorNote error={unplacedError(update.error, server, ['supersededById'])} />
      </div>
      {saved && <ChangeNote title="Supersession saved" changes={saved.changes} at={saved.at} />}
    </Section>
  );
}
