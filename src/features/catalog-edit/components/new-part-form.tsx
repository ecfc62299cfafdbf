import { useState } from 'react';
import { useFormContext, useWatch, type DefaultValues } from 'react-hook-form';
import type { z } from 'zod';
import type { Brand } from '@shared/schemas/brands';
import { createPartBodySchema, type PartDetail } from '@shared/schemas/parts';
import { PART_KINDS, type PartKind } from '@shared/schemas/specs';
import { Button } from '@/components/ui/button';
import { controlClass } from '@/components/ui/field';
import { Field, Form, FormFieldFrame, useSchemaForm } from '@/components/ui/form';
import { useCreatePart } from '../api/create-part';
import { createdChanges } from '../changes';
import { placedError } from '../field-messages';
import { specStartValues } from '../spec-fields';
import { ChangeNote } from './change-note';
import { SpecFields } from './spec-fields';

const KIND_WORDS: Record<PartKind, string> = { coil: 'Ignition coil', plug: 'Spark plug' };

type NewPart = z.input<typeof createPartBodySchema>;

/** Empty but for what stays for the next part of a series: the brand and the kind. */
const startValues = (brand: string | undefined, kind: PartKind): DefaultValues<NewPart> => ({
  brand,
  kind,
  partNumber: '',
  description: '',
  gtin: null,
  coil: specStartValues('coil', null),
  plug: specStartValues('plug', null),
});

function KindRadios() {
  const { register } = useFormContext<NewPart>();
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">Kind</legend>
      <div className="inline-flex w-fit rounded-md border border-ink/20">
        {PART_KINDS.map((k) => (
          <label
            key={k}
            className="cursor-pointer border-r border-ink/10 px-3 py-1.5 text-[15px] first:rounded-l-md last:rounded-r-md last:border-r-0 has-[:checked]:bg-accent has-[:checked]:text-white has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-accent has-[:focus-visible]:outline-solid"
          >
            <input type="radio" value={k} className="sr-only" {...register('kind')} />
            {KIND_WORDS[k]}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

/** The brand, from the list: our lines first, then the other makers held for their specs. */
function BrandSelect({ brands, chosen }: { brands: readonly Brand[]; chosen: Brand | null }) {
  const { register } = useFormContext<NewPart>();
  const ours = brands.filter((b) => b.ours);
  const others = brands.filter((b) => !b.ours);
  const group = (label: string, list: readonly Brand[]) =>
    list.length > 0 && (
      <optgroup label={label}>
        {list.map((b) => (
          <option key={b.id} value={b.name}>
            {b.name}
          </option>
        ))}
      </optgroup>
    );
  return (
    <FormFieldFrame
      name="brand"
      label="Brand"
      hint={chosen && !chosen.ours ? 'Another maker: held for its spec, so claims against it can be judged. Not sold.' : undefined}
    >
      {(ids) => (
        <select
          {...register('brand', { setValueAs: (v: string) => (v === '' ? undefined : v) })}
          {...ids}
          className={controlClass(ids['aria-invalid'] && 'invalid')}
        >
          <option value="">Choose…</option>
          {group('Our lines', ours)}
          {group('Other makers', others)}
        </select>
      )}
    </FormFieldFrame>
  );
}

/**
 * Adds a part: its brand from the list, its number as printed, coil or plug, a description, a
 * GTIN and, when it is to hand, its spec. Brand and kind stay for the next part of a series.
 */
export function NewPartForm({ brands, onOpen }: { brands: readonly Brand[]; onOpen: (id: string) => void }) {
  // A field that is not shown is not sent: the spec of the kind not chosen, or any spec while it is left out.
  const form = useSchemaForm(createPartBodySchema, { defaultValues: startValues(undefined, 'plug'), shouldUnregister: true });
  const [withSpec, setWithSpec] = useState(false);
  const [created, setCreated] = useState<{ detail: PartDetail; at: Date } | null>(null);
  const create = useCreatePart();
  const kind = useWatch({ control: form.control, name: 'kind' }) ?? 'plug';
  const brandName = useWatch({ control: form.control, name: 'brand' });
  const brand = brands.find((b) => b.name === brandName) ?? null;
  // Per field: with fields unregistered when hidden, the whole form never equals its start values.
  const edited = Object.keys(form.formState.dirtyFields).length > 0;

  return (
    <Form
      form={form}
      aria-label="Add a part"
      onSubmit={(body) =>
        create.mutate(body, {
          onSuccess: (detail) => {
            setCreated({ detail, at: new Date() });
            form.reset(startValues(body.brand, body.kind));
          },
        })
      }
      serverError={placedError(create.error)}
      className="flex flex-col gap-4"
    >
      <div className="flex flex-wrap items-start gap-x-4 gap-y-3">
        <div className="w-64 max-w-full">
          <BrandSelect brands={brands} chosen={brand} />
        </div>
        <KindRadios />
        <div className="w-60 max-w-full">
          <Field name="partNumber" label="Part number" maxLength={60} className="font-mono" hint="as printed on the box" />
        </div>
        <div className="w-56 max-w-full">
          <Field
            name="gtin"
            label="GTIN"
            blank="null"
            inputMode="numeric"
            maxLength={14}
            className="font-mono"
            hint="optional; 8, 12, 13 or 14 digits"
          />
        </div>
      </div>
      <div className="max-w-4xl">
        <Field name="description" label="Description" maxLength={500} />
      </div>
      <fieldset className="flex min-w-0 flex-col gap-3 rounded-md border border-ink/10 px-3 py-2">
        <legend className="px-1">
          <label className="flex items-center gap-2 text-[15px] font-medium text-ink">
            <input type="checkbox" checked={withSpec} onChange={(e) => setWithSpec(e.target.checked)} className="h-4 w-4 accent-accent" />
            Add its {kind} spec now
          </label>
        </legend>
        {withSpec ? (
          <SpecFields key={kind} kind={kind} brand={brand} prefix={`${kind}.`} />
        ) : (
          <p className="text-sm text-review">Without a spec: no spec — no verdict, until one is added.</p>
        )}
      </fieldset>
      <div>
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? 'Adding…' : 'Add part'}
        </Button>
      </div>
      {/* Said of the part just added, until the next one is typed. */}
      {created && !edited && (
        <ChangeNote title="Part added" changes={createdChanges(created.detail)} at={created.at}>
          <div className="mt-2">
            <Button variant="secondary" onClick={() => onOpen(created.detail.part.id)}>
              Open {created.detail.part.partNumber} to add interchange
            </Button>
          </div>
        </ChangeNote>
      )}
    </Form>
  );
}
