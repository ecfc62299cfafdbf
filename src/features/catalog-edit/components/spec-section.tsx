import { useState } from 'react';
import type { DefaultValues, FieldValues, UseFormReturn } from 'react-hook-form';
import type { z } from 'zod';
import type { Brand } from '@shared/schemas/brands';
import type { PartDetail } from '@shared/schemas/parts';
import { coilSpecSchema, plugSpecSchema, type PartKind } from '@shared/schemas/specs';
import { Button } from '@/components/ui/button';
import { Form, useSchemaForm } from '@/components/ui/form';
import { useUpdatePart } from '../api/update-part';
import { partChanges, type Change } from '../changes';
import { placedError } from '../field-messages';
import { specStartValues, type SpecBody } from '../spec-fields';
import { ChangeNote } from './change-note';
import { Section } from './section';
import { SpecFields } from './spec-fields';

export const NO_SPEC_NOTE = 'no spec — no verdict';

type Saved = { changes: Change[]; at: Date };

/**
 * The part's coil or plug spec, every field with its unit. Without one the part gets no verdict
 * anywhere, and the section says so and offers to add it.
 */
export function SpecSection({ detail, brand }: { detail: PartDetail; brand: Brand | null }) {
  const { part, spec } = detail;
  const kind = part.kind;
  const [adding, setAdding] = useState(false);
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
      </Section>
    );
  }
  const props = { detail, brand, title, onCancel: spec ? null : () => setAdding(false) };
  return (
    <Section title={title} aside={!spec && <span className="text-sm text-review">new — not saved yet</span>}>
      {kind === 'coil' ? <CoilSpecForm {...props} /> : <PlugSpecForm {...props} />}
    </Section>
  );
}

interface SpecFormProps {
  detail: PartDetail;
  brand: Brand | null;
  title: string;
  /** Backs out of adding a spec; null when the part has one. */
  onCancel: (() => void) | null;
}

function CoilSpecForm(props: SpecFormProps) {
  const form = useSchemaForm(coilSpecSchema, {
    defaultValues: specStartValues('coil', props.detail.spec) as DefaultValues<z.input<typeof coilSpecSchema>>,
  });
  return <SpecFormOn form={form} kind="coil" body={(coil) => ({ coil })} {...props} />;
}

function PlugSpecForm(props: SpecFormProps) {
  const form = useSchemaForm(plugSpecSchema, {
    defaultValues: specStartValues('plug', props.detail.spec) as DefaultValues<z.input<typeof plugSpecSchema>>,
  });
  return <SpecFormOn form={form} kind="plug" body={(plug) => ({ plug })} {...props} />;
}

function SpecFormOn<TIn extends FieldValues, TOut>({
  form,
  kind,
  body,
  detail,
  brand,
  title,
  onCancel,
}: SpecFormProps & { form: UseFormReturn<TIn, unknown, TOut>; kind: PartKind; body: (spec: TOut) => SpecBody }) {
  const [saved, setSaved] = useState<Saved | null>(null);
  const update = useUpdatePart();
  const { isDirty } = form.formState;
  return (
    <Form
      form={form}
      aria-label={title}
      onSubmit={(spec) =>
        update.mutate(
          { id: detail.part.id, body: body(spec) },
          {
            onSuccess: (after) => {
              // The form now shows the spec as saved; the note goes once it is edited again.
              form.reset(specStartValues(kind, after.spec) as TIn);
              setSaved({ changes: partChanges(detail, after), at: new Date() });
            },
          },
        )
      }
      serverError={placedError(update.error)}
      serverFieldPrefix={kind}
      className="flex flex-col gap-3"
    >
      <SpecFields kind={kind} brand={brand} />
      <div className="flex gap-2">
        <Button type="submit" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save spec'}
        </Button>
        {onCancel && (
          <Button variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
      {saved && !isDirty && <ChangeNote title="Spec saved" changes={saved.changes} at={saved.at} />}
    </Form>
  );
}
