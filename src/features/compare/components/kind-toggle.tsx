import type { PartKind } from '@shared/schemas/specs';

const LABELS: Record<PartKind, string> = { coil: 'Ignition coil', plug: 'Spark plug' };

/** Coil or plug: which table of checks the comparison uses. */
export function KindToggle({ kind, onChange }: { kind: PartKind; onChange: (kind: PartKind) => void }) {
  return (
    <fieldset className="flex items-center gap-1 rounded-lg border border-ink/15 bg-paper-raised p-1 print:hidden">
      <legend className="sr-only">Compare</legend>
      {(Object.keys(LABELS) as PartKind[]).map((k) => (
        <label
          key={k}
          className={`cursor-pointer rounded-md px-3 py-1.5 text-[15px] font-medium has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-accent ${
            k === kind ? 'bg-accent text-white' : 'text-ink-soft hover:bg-paper-sunk'
          }`}
        >
          <input type="radio" name="compare-kind" value={k} checked={k === kind} onChange={() => onChange(k)} className="sr-only" />
          {LABELS[k]}
        </label>
      ))}
    </fieldset>
  );
}
