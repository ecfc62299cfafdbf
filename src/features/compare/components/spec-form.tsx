import { useId, useState, type FormEvent } from 'react';
import type { CoilSpec, PartKind, ResolvedPlugSpec } from '@shared/schemas/specs';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { fieldsFor, parseCoilSpec, parsePlugSpec, specMessage, type FormValues } from '../spec-fields';

export type TypedSpec = { kind: 'coil'; spec: CoilSpec } | { kind: 'plug'; spec: ResolvedPlugSpec };

function CheckboxField({ label, checked, onChange }: { label: string; checked: boolean; onChange: (v: boolean) => void }) {
  const id = useId();
  return (
    <div className="flex items-center gap-2 self-end pb-2">
      <input id={id} type="checkbox" checked={checked} onChange={(e) => onChange(e.target.checked)} className="h-4 w-4 accent-accent" />
      <label htmlFor={id} className="text-[15px] text-ink">
        {label}
      </label>
    </div>
  );
}

/**
 * Every spec field of a coil or a plug, with its unit: for a part we do not stock, or a coil a
 * technician measured. Checked with the API's own schema before it is used; the API's field
 * messages (serverErrors) are shown by their fields too.
 */
export function SpecForm({
  kind,
  initial,
  serverErrors = {},
  submitLabel = 'Use this spec',
  onSubmit,
  name,
}: {
  kind: PartKind;
  initial: FormValues;
  serverErrors?: Record<string, string>;
  submitLabel?: string;
  onSubmit: (typed: TypedSpec) => void;
  /** The form's accessible name, e.g. "Substitute spec". */
  name: string;
}) {
  const [values, setValues] = useState<FormValues>(initial);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const set = (field: string, v: string | boolean) => setValues((prev) => ({ ...prev, [field]: v }));

  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (kind === 'coil') {
      const r = parseCoilSpec(values);
      if (r.ok) onSubmit({ kind, spec: r.spec });
      setErrors(r.ok ? {} : r.errors);
    } else {
      const r = parsePlugSpec(values);
      if (r.ok) onSubmit({ kind, spec: r.spec });
      setErrors(r.ok ? {} : r.errors);
    }
  };

  return (
    <form aria-label={name} onSubmit={submit} noValidate className="flex flex-col gap-3">
      <div className="grid grid-cols-[repeat(auto-fill,minmax(14rem,1fr))] gap-x-3 gap-y-2.5">
        {fieldsFor(kind).map((f) => {
          const server = serverErrors[f.name];
          const error = errors[f.name] ?? (server ? specMessage(server) : undefined);
          const v = values[f.name];
          if (f.input === 'checkbox')
            return <CheckboxField key={f.name} label={f.label} checked={v === true} onChange={(c) => set(f.name, c)} />;
          if (f.input === 'select') {
            return (
              <SelectField
                key={f.name}
                label={f.label}
                value={typeof v === 'string' ? v : ''}
                onChange={(e) => set(f.name, e.target.value)}
              >
                {(f.options ?? []).map((o) => (
                  <option key={o} value={o}>
                    {o}
                  </option>
                ))}
              </SelectField>
            );
          }
          return (
            <TextField
              key={f.name}
              label={f.label}
              unit={f.unit}
              inputMode={f.input === 'text' ? 'text' : 'decimal'}
              value={typeof v === 'string' ? v : ''}
              onChange={(e) => set(f.name, e.target.value)}
              hint={f.hint ?? (f.optional ? 'optional' : undefined)}
              error={error}
            />
          );
        })}
      </div>
      <div>
        <Button type="submit" variant="secondary">
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
