import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { ErrorNote } from '@/components/ui/panel';
import type { Brand } from '@shared/schemas/brands';
import type { PartDetail } from '@shared/schemas/parts';
import { useUpdatePart } from '../api/update-part';
import { partChanges, type Change } from '../changes';
import { fieldMessages, unplacedError } from '../field-messages';
import { emptySpecValues, parseSpec, specFieldsFor, specValuesOf, type SpecValues } from '../spec-fields';
import { ChangeNote } from './change-note';
import { Section } from './section';
import { SpecFields } from './spec-fields';

export const NO_SPEC_NOTE = 'no spec — no verdict';

/**
 * The part's coil or plug spec, every field with its unit. Without one the part gets no verdict
 * anywhere, and the section says so and offers to add it.
 */
export function SpecSection({ detail, brand }: { detail: PartDetail; brand: Brand | null }) {
  const { part, spec } = detail;
  const kind = part.kind;
  const [adding, setAdding] = useState(false);
  const [values, setValues] = useState<SpecValues>(() => (spec ? specValuesOf(kind, spec) : emptySpecValues(kind)));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState<{ changes: Change[]; at: Date } | null>(null);
  const update = useUpdatePart();
  const server = fieldMessages(update.error, kind);
  const shown = { ...server, ...errors };
  const names = specFieldsFor(kind).map((f) => f.name);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    update.reset();
    const parsed = parseSpec(kind, values);
    if (!parsed.ok) {
      setErrors(parsed.errors);
      setSaved(null);
      return;
    }
    setErrors({});
    update.mutate(
      { id: part.id, body: parsed.body },
      {
        onSuccess: (after) => {
          setAdding(false);
          setSaved({ changes: partChanges(detail, after), at: new Date() });
        },
      },
    );
  };

  const title = kind === 'coil' ? 'Coil spec' : 'Plug spec';
  if (!spec && !adding) {
    return (
      <Section title={title}>
        <p className="font-semibold text-review">{NO_SPEC_NOTE}</p>
        <p className="text-[15px] text-ink-soft">
          Without a spec this {kind} gets no verdict on the Counter or in Compare, and interchange claims on it cannot be judged.
        </p>
        <div>
          <Button onClick={() => setAdding(true)}>Add a spec</Button>
        </div>
        {saved && <ChangeNote title="Spec saved" changes={saved.changes} at={saved.at} />}
      </Section>
    );
  }

  return (
    <Section title={title} aside={!spec && <span className="text-sm text-review">new — not saved yet</span>}>
      <form aria-label={title} onSubmit={submit} noValidate className="flex flex-col gap-3">
        <SpecFields kind={kind} values={values} errors={shown} brand={brand} onChange={setValues} />
        <ErrorNote error={unplacedError(update.error, server, names)} />
        <div className="flex gap-2">
          <Button type="submit" disabled={update.isPending}>
            {update.isPending ? 'Saving…' : 'Save spec'}
          </Button>
          {!spec && (
            <Button
              variant="ghost"
              onClick={() => {
                setAdding(false);
                setErrors({});
                update.reset();
              }}
            >
              Cancel
            </Button>
          )}
        </div>
        {saved && <ChangeNote title="Spec saved" changes={saved.changes} at={saved.at} />}
      </form>
    </Section>
  );
}
