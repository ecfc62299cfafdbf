import { useWatch } from 'react-hook-form';
import type { Brand } from '@shared/schemas/brands';
import type { PartKind } from '@shared/schemas/specs';
import { Field, FieldCheckbox, FieldSelect } from '@/components/ui/form';
import { specFieldsFor } from '../spec-fields';

/** A plug's heat code, chosen from its brand's heat table, each code with the heat step it stands for. */
function HeatCodeField({ name, heatCodes, brand }: { name: string; heatCodes: Brand['heatCodes']; brand: string }) {
  const value: unknown = useWatch({ name });
  const current = typeof value === 'string' ? value : '';
  // A code on file that the table no longer holds is still shown, so saving other fields keeps it.
  const unknown = current !== '' && !heatCodes.some((h) => h.code === current);
  return (
    <FieldSelect
      name={name}
      label="Heat code"
      blank="absent"
      disabled={heatCodes.length === 0}
      placeholder={heatCodes.length ? 'Choose…' : 'no heat table'}
      hint={heatCodes.length ? `from ${brand}'s heat table` : `${brand} has no heat codes on file`}
      options={[
        ...(unknown ? [{ value: current, label: `${current} (not in the table)` }] : []),
        ...heatCodes.map((h) => ({ value: h.code, label: `${h.code} — heat step ${h.heatStep}` })),
      ]}
    />
  );
}

/**
 * Every spec field of a coil or a plug, each with its unit, bound to the enclosing Form under
 * `prefix` ("plug." on a new part, "" on a spec form of its own). A plug's heat code is chosen
 * from its brand's table.
 */
export function SpecFields({
  kind,
  brand,
  prefix = '',
}: {
  kind: PartKind;
  /** The part's brand: its heat table gives a plug's heat codes. */
  brand: Brand | null;
  prefix?: string;
}) {
  const fields = specFieldsFor(kind);
  return (
    <div className="flex flex-col gap-3">
      <div className="grid grid-cols-[repeat(auto-fill,minmax(11.5rem,1fr))] gap-x-3 gap-y-2.5">
        {fields.map((f) => {
          const name = `${prefix}${f.name}`;
          if (f.input === 'checkbox') return null;
          if (f.name === 'heatCode')
            return <HeatCodeField key={f.name} name={name} heatCodes={brand?.heatCodes ?? []} brand={brand?.name ?? 'the brand'} />;
          if (f.input === 'select')
            return (
              <FieldSelect
                key={f.name}
                name={name}
                label={f.label}
                options={(f.options ?? []).map((o) => ({ value: o, label: f.words?.[o] ?? o }))}
              />
            );
          const number = f.input !== 'text';
          return (
            <Field
              key={f.name}
              name={name}
              label={f.label}
              unit={f.unit}
              number={number}
              inputMode={f.input === 'text' ? 'text' : f.input === 'integer' ? 'numeric' : 'decimal'}
              blank={f.optional ? 'null' : number ? 'absent' : 'keep'}
              hint={f.hint ?? (f.optional ? 'optional' : undefined)}
            />
          );
        })}
      </div>
      <div className="flex flex-wrap gap-x-6 gap-y-1.5">
        {fields
          .filter((f) => f.input === 'checkbox')
          .map((f) => (
            <FieldCheckbox key={f.name} name={`${prefix}${f.name}`} label={f.label} />
          ))}
      </div>
    </div>
  );
}
