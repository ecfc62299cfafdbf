import { useId, useState, type FormEvent } from 'react';
import { createPartBodySchema } from '@shared/schemas/parts';
import { PART_KINDS, type PartKind } from '@shared/schemas/specs';
import { issuesByPath } from '@/components/ui/field-errors';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorNote } from '@/components/ui/panel';
import { useCreatePart } from '../api/create-part';
import type { Brand } from '@shared/schemas/brands';
import type { PartDetail } from '@shared/schemas/parts';
import { createdChanges } from '../changes';
import { fieldMessages, unplacedError } from '../field-messages';
import { emptySpecValues, parseSpec, specFieldsFor, type SpecValues } from '../spec-fields';
import { ChangeNote } from './change-note';
import { SpecFields } from './spec-fields';

const FIELDS = ['brand', 'partNumber', 'kind', 'description', 'gtin'] as const;
const KIND_WORDS: Record<PartKind, string> = { coil: 'Ignition coil', plug: 'Spark plug' };

function KindRadios({ value, onChange }: { value: PartKind; onChange: (k: PartKind) => void }) {
  const name = useId();
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">Kind</legend>
      <div className="inline-flex w-fit rounded-md border border-ink/20">
        {PART_KINDS.map((k) => (
          <label
            key={k}
            className="cursor-pointer border-r border-ink/10 px-3 py-1.5 text-[15px] first:rounded-l-md last:rounded-r-md last:border-r-0 has-[:checked]:bg-accent has-[:checked]:text-white has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-accent has-[:focus-visible]:outline-solid"
          >
            <input type="radio" name={name} className="sr-only" checked={value === k} onChange={() => onChange(k)} />
            {KIND_WORDS[k]}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

/**
 * Adds a part: its brand from the list, its number as printed, coil or plug, a description, a
 * GTIN and, when it is to hand, its spec. Brand and kind stay for the next part of a series.
 */
export function NewPartForm({ brands, onOpen }: { brands: readonly Brand[]; onOpen: (id: string) => void }) {
  const [brandName, setBrandName] = useState('');
  const [kind, setKind] = useState<PartKind>('plug');
  const [partNumber, setPartNumber] = useState('');
  const [description, setDescription] = useState('');
  const [gtin, setGtin] = useState('');
  const [withSpec, setWithSpec] = useState(false);
  const [spec, setSpec] = useState<SpecValues>(() => emptySpecValues('plug'));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [specErrors, setSpecErrors] = useState<Record<string, string>>({});
  const [created, setCreated] = useState<{ detail: PartDetail; at: Date } | null>(null);
  const create = useCreatePart();
  const specToggle = useId();

  const brand = brands.find((b) => b.name === brandName) ?? null;
  const server = fieldMessages(create.error);
  const serverSpec = fieldMessages(create.error, kind);
  const shown = { ...server, ...errors };
  const shownSpec = { ...serverSpec, ...specErrors };

  const chooseKind = (k: PartKind) => {
    setKind(k);
    setSpec(emptySpecValues(k));
    setSpecErrors({});
  };

  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.reset();
    const parsedSpec = withSpec ? parseSpec(kind, spec) : null;
    const checked = createPartBodySchema.safeParse({
      brand: brandName,
      partNumber,
      kind,
      description,
      gtin: gtin.trim() === '' ? undefined : gtin,
      ...(parsedSpec?.ok ? parsedSpec.body : {}),
    });
    const found = checked.success ? {} : issuesByPath(checked.error);
    if (found.brand) found.brand = 'choose the brand';
    if (found.partNumber && partNumber.trim() === '') found.partNumber = 'required';
    setErrors(found);
    setSpecErrors(parsedSpec && !parsedSpec.ok ? parsedSpec.errors : {});
    if (!checked.success || (parsedSpec && !parsedSpec.ok)) return;
    create.mutate(checked.data, {
      onSuccess: (detail) => {
        setCreated({ detail, at: new Date() });
        setPartNumber('');
        setDescription('');
        setGtin('');
        setSpec(emptySpecValues(kind));
      },
    });
  };

  const ours = brands.filter((b) => b.ours);
  const others = brands.filter((b) => !b.ours);
  return (
    <form aria-label="Add a part" onSubmit={submit} noValidate className="flex flex-col gap-4">
      <div className="flex flex-wrap items-start gap-x-4 gap-y-3">
        <div className="w-64">
          <SelectField
            label="Brand"
            value={brandName}
            onChange={(e) => setBrandName(e.target.value)}
            error={shown.brand}
            hint={brand && !brand.ours ? 'Another maker: held for its spec, so claims against it can be judged. Not sold.' : undefined}
          >
            <option value="">Choose…</option>
            {ours.length > 0 && (
              <optgroup label="Our lines">
                {ours.map((b) => (
                  <option key={b.id} value={b.name}>
                    {b.name}
                  </option>
                ))}
              </optgroup>
            )}
            {others.length > 0 && (
              <optgroup label="Other makers">
                {others.map((b) => (
                  <option key={b.id} value={b.name}>
                    {b.name}
                  </option>
                ))}
              </optgroup>
            )}
          </SelectField>
        </div>
        <KindRadios value={kind} onChange={chooseKind} />
        <div className="w-60">
          <TextField
            label="Part number"
            maxLength={60}
            value={partNumber}
            onChange={(e) => setPartNumber(e.target.value)}
            error={shown.partNumber}
            className="font-mono"
            hint="as printed on the box"
          />
        </div>
        <div className="w-56">
          <TextField
            label="GTIN"
            inputMode="numeric"
            maxLength={14}
            value={gtin}
            onChange={(e) => setGtin(e.target.value)}
            error={shown.gtin}
            className="font-mono"
            hint="optional; 8, 12, 13 or 14 digits"
          />
        </div>
      </div>
      <div className="max-w-4xl">
        <TextField
          label="Description"
          maxLength={500}
          value={description}
          onChange={(e) => setDescription(e.target.value)}
          error={shown.description}
        />
      </div>
      <fieldset className="flex flex-col gap-3 rounded-md border border-ink/10 px-3 py-2">
        <legend className="px-1">
          <span className="flex items-center gap-2">
            <input
              id={specToggle}
              type="checkbox"
              checked={withSpec}
              onChange={(e) => setWithSpec(e.target.checked)}
              className="h-4 w-4 accent-accent"
            />
            <label htmlFor={specToggle} className="text-[15px] font-medium text-ink">
              Add its {kind} spec now
            </label>
          </span>
        </legend>
        {withSpec ? (
          <SpecFields kind={kind} values={spec} errors={shownSpec} brand={brand} onChange={setSpec} />
        ) : (
          <p className="text-sm text-review">Without a spec: no spec — no verdict, until one is added.</p>
        )}
      </fieldset>
      <ErrorNote
        error={unplacedError(create.error, { ...server, ...serverSpec }, [...FIELDS, ...specFieldsFor(kind).map((f) => f.name)])}
      />
      <div>
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? 'Adding…' : 'Add part'}
        </Button>
      </div>
      {created && (
        <ChangeNote title="Part added" changes={createdChanges(created.detail)} at={created.at}>
          <div className="mt-2">
            <Button variant="secondary" onClick={() => onOpen(created.detail.part.id)}>
              Open {created.detail.part.partNumber} to add interchange
            </Button>
          </div>
        </ChangeNote>
      )}
    </form>
  );
}
