import type { PartKind } from '@shared/schemas/specs';

const CHOICES: { value: PartKind | null; label: string }[] = [
  { value: null, label: 'Any' },
  { value: 'coil', label: 'Coils' },
  { value: 'plug', label: 'Plugs' },
];

/**
 * Coil, plug or either: native radios, so arrow keys move between them as in any radio group.
 * The radio itself is hidden; its label carries the focus ring (no overflow clip, or the ring is cut).
 */
export function KindChoice({ value, onChange }: { value: PartKind | null; onChange: (kind: PartKind | null) => void }) {
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink-soft">Kind</legend>
      <div className="inline-flex w-fit rounded-md border border-ink/20">
        {CHOICES.map((c) => (
          <label
            key={c.label}
            className="cursor-pointer border-r border-ink/10 px-3 py-1.5 text-[15px] first:rounded-l-md last:rounded-r-md last:border-r-0 has-[:checked]:bg-accent has-[:checked]:text-white has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-solid has-[:focus-visible]:outline-accent"
          >
            <input type="radio" name="part-kind" className="sr-only" checked={value === c.value} onChange={() => onChange(c.value)} />
            {c.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
