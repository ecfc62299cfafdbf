import { useId } from 'react';
import type { PartKind } from '@shared/schemas/specs';
import { SelectField, TextField } from '@/components/ui/field';
import type { Brand } from '@shared/schemas/brands';
import { specFieldsFor, specMessage, type SpecValues } from '../spec-fields';

function Checkbox({ label, checked, onChange }: { label: string; checked: boolean; onChange: (v: boolean) => void }) {
  const id = useId();
  return (
    <div className="flex items-center gap-2">
      <input id={id} type="checkbox" checked={checked} onChange={(e) => onChange(e.target.checked)} className="h-4 w-4 accent-accent" />
      <label htmlFor={id} className="text-[15px] text-ink">
        {label}
      </label>
    </div>
  );
}

function HeatCodeField({
  value,
  heatCodes,
  brand,
  error,
  onChange,
}: {
  value: string;
  heatCodes: Brand['heatCodes'];
  brand: string;
  error: string | undefined;
  onChange: (v: string) => void;
}) {
  const known = heatCodes.some((h) => h.code === value);
  return (
    <SelectField
      label="Heat code"
      value={value}
      onChange={(e) => onChange(e.target.value)}
      disabled={heatCodes.length === 0}
      error={error}
      hint={heatCodes.length ? `from ${brand}'s heat table` : `${brand} has no heat codes on file`}
    >
      <option value="">{heatCodes.length ? 'Choose…' : 'no heat table'}</option>
      {!known && value !== '' && <option value={value}>{value} (not in the table)</option>}
      {heatCodes.map((h) => (
        <option key={h.code} value={h.code}>
          {h.code} — heat step {h.heatStep}
        </option>
      ))}
    </SelectField>
  );
}

/**
 * Every spec field of a coil or a plug, each with its unit, as a group inside a form. A plug's
 * heat code is chosen from its brand's table, showing the heat step it stands for.
 */
export function SpecFields({
  kind,
  values,
  errors,
  brand,
  onChange,
}: {
  kind: PartKind;
  values: SpecValues;
  errors: Record<string, string>;
  /** The part's brand: its heat table gives a plug's heat codes. */
  brand: Brand | null;
  onChange: (values: SpecValues) => void;
}) {
  const set = (name: string, v: string | boolean) => onChange({ ...values, [name]: v });
  const fields = specFieldsFor(kind);
  const boxes = fields.filter((f) => f.input === 'checkbox');
  return (
    <div className="flex flex-col gap-3">
      <div className="grid grid-cols-[repeat(auto-fill,minmax(11.5rem,1fr))] gap-x-3 gap-y-2.5">
        {fields.map((f) => {
          const v = values[f.name];
          const text = typeof v === 'string' ? v : '';
          const raw = errors[f.name];
          const error = raw === undefined ? undefined : specMessage(raw, f.name);
          if (f.input === 'checkbox') return null;
          if (f.name === 'heatCode')
            return (
              <HeatCodeField
                key={f.name}
                value={text}
                heatCodes={brand?.heatCodes ?? []}
                brand={brand?.name ?? 'the brand'}
                error={error}
                onChange={(c) => set(f.name, c)}
              />
            );
          if (f.input === 'select')
            return (
              <SelectField key={f.name} label={f.label} value={text} onChange={(e) => set(f.name, e.target.value)} error={error}>
                {(f.options ?? []).map((o) => (
                  <option key={o} value={o}>
                    {o}
                  </option>
                ))}
              </SelectField>
            );
          return (
            <TextField
              key={f.name}
              label={f.label}
              unit={f.unit}
              inputMode={f.input === 'text' ? 'text' : f.input === 'integer' ? 'numeric' : 'decimal'}
              value={text}
              onChange={(e) => set(f.name, e.target.value)}
              hint={f.hint ?? (f.optional ? 'optional' : undefined)}
              error={error}
            />
          );
        })}
      </div>
      {boxes.length > 0 && (
        <div className="flex flex-wrap gap-x-6 gap-y-1.5">
          {boxes.map((f) => (
            <Checkbox key={f.name} label={f.label} checked={values[f.name] === true} onChange={(c) => set(f.name, c)} />
          ))}
        </div>
      )}
    </div>
  );
}
