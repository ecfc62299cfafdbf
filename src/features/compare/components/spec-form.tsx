import { useEffect } from 'react';
import type { DefaultValues, FieldValues, UseFormReturn } from 'react-hook-form';
import type { z } from 'zod';
import { coilSpecSchema, resolvedPlugSpecSchema, type CoilSpec, type PartKind, type ResolvedPlugSpec } from '@shared/schemas/specs';
import { specFieldsOf, type SpecFieldDef } from '@shared/spec-fields';
import { Button } from '@/components/ui/button';
import { Field, FieldCheckbox, FieldSelect, Form, useResultIsCurrent, useSchemaForm } from '@/components/ui/form';

export type TypedSpec = { kind: 'coil'; spec: CoilSpec } | { kind: 'plug'; spec: ResolvedPlugSpec };

interface SpecFormProps {
  /** The spec to start typing from (the part's, the typed one in use, the original's); none: empty. */
  initial: CoilSpec | ResolvedPlugSpec | null;
  /** Whether this form's spec is the one the comparison uses now. */
  applied: boolean;
  submitLabel?: string;
  /** The form's accessible name, e.g. "Substitute spec". */
  name: string;
  onSubmit: (typed: TypedSpec) => void;
  /**
   * Whether what the form shows differs from what the comparison uses (an edit since "Use this
   * spec", valid or not): the page then stops showing the verdict as current.
   */
  onOutOfDate: (outOfDate: boolean) => void;
}

/**
 * Every spec field of a coil or a plug, with its unit (shared/spec-fields.ts): for a part we do
 * not stock, or a coil a technician measured. Checked with the API's own schema before it is used.
 */
export function SpecForm({ kind, initial, ...props }: SpecFormProps & { kind: PartKind }) {
  return kind === 'coil' ? <CoilSpecForm initial={initial} {...props} /> : <PlugSpecForm initial={initial} {...props} />;
}

/** Selects on their first option, tick boxes off: the values a form starts from with no spec. */
function startValues(fields: readonly SpecFieldDef[], initial: object | null): Record<string, unknown> {
  const start: Record<string, unknown> = {};
  for (const f of fields) {
    if (f.input === 'select') start[f.name] = f.options?.[0];
    else if (f.input === 'checkbox') start[f.name] = false;
  }
  return { ...start, ...initial };
}

function CoilSpecForm({ initial, onSubmit, ...props }: SpecFormProps) {
  const form = useSchemaForm(coilSpecSchema, {
    defaultValues: startValues(specFieldsOf('coil'), initial) as DefaultValues<z.input<typeof coilSpecSchema>>,
  });
  return <SpecFormOn form={form} kind="coil" onSubmit={(spec) => onSubmit({ kind: 'coil', spec })} {...props} />;
}

function PlugSpecForm({ initial, onSubmit, ...props }: SpecFormProps) {
  const form = useSchemaForm(resolvedPlugSpecSchema, {
    defaultValues: startValues(specFieldsOf('plug'), initial) as DefaultValues<z.input<typeof resolvedPlugSpecSchema>>,
  });
  return <SpecFormOn form={form} kind="plug" onSubmit={(spec) => onSubmit({ kind: 'plug', spec })} {...props} />;
}

function SpecFormOn<TIn extends FieldValues, TOut>({
  form,
  kind,
  applied,
  submitLabel = 'Use this spec',
  name,
  onSubmit,
  onOutOfDate,
}: Omit<SpecFormProps, 'initial' | 'onSubmit'> & {
  form: UseFormReturn<TIn, unknown, TOut>;
  kind: PartKind;
  onSubmit: (spec: TOut) => void;
}) {
  const { isCurrent, shown } = useResultIsCurrent(form);
  const { isDirty } = form.formState;
  // A spec in use, shown again (the form reopened): what is on screen is what is used.
  useEffect(() => {
    if (applied) shown();
  }, [applied, shown]);
  const outOfDate = applied ? !isCurrent : isDirty;
  useEffect(() => {
    onOutOfDate(outOfDate);
  }, [outOfDate, onOutOfDate]);
  useEffect(() => () => onOutOfDate(false), [onOutOfDate]);

  return (
    <Form
      form={form}
      aria-label={name}
      onSubmit={(spec) => {
        shown();
        onSubmit(spec);
      }}
      className="flex flex-col gap-3"
    >
      <div className="grid grid-cols-[repeat(auto-fill,minmax(14rem,1fr))] gap-x-3 gap-y-2.5">
        {specFieldsOf(kind).map((f) => {
          if (f.input === 'checkbox') return <FieldCheckbox key={f.name} name={f.name} label={f.label} />;
          const hint = f.hint ?? (f.optional ? 'optional' : undefined);
          if (f.input === 'select') {
            const options = (f.options ?? []).map((o) => ({ value: o, label: f.words?.[o] ?? o }));
            return <FieldSelect key={f.name} name={f.name} label={f.label} hint={hint} options={options} />;
          }
          const number = f.input !== 'text';
          return (
            <Field
              key={f.name}
              name={f.name}
              label={f.label}
              unit={f.unit}
              hint={hint}
              number={number}
              blank={f.optional ? 'null' : number ? 'absent' : 'keep'}
            />
          );
        })}
      </div>
      <div>
        <Button type="submit" variant="secondary">
          {submitLabel}
        </Button>
      </div>
    </Form>
  );
}
