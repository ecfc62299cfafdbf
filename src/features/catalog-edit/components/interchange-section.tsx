import { createColumnHelper } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { z } from 'zod';
import { formatMeasure } from '@shared/format';
import type { Brand } from '@shared/schemas/brands';
import { createInterchangeBodySchema } from '@shared/schemas/interchange';
import type { InterchangeRow, PartDetail } from '@shared/schemas/parts';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { Field, Form, useSchemaForm } from '@/components/ui/form';
import { VerdictBadge } from '@/features/compat/components/verdict-badge';
import { useCreateInterchange } from '../api/create-interchange';
import type { Change } from '../changes';
import { placedError } from '../field-messages';
import { ChangeNote } from './change-note';
import { Section } from './section';

const SOURCES = ['manual', 'supplier catalogue', 'maker cross-reference', 'bench-checked'];

// The buyer types how sure in percent; the request carries a fraction, held to the request's own limits.
const rowFormSchema = createInterchangeBodySchema.extend({
  confidence: z
    .number()
    .transform((pct) => pct / 100)
    .refine((f) => createInterchangeBodySchema.shape.confidence.safeParse(f).success, 'must be a percentage from 0 to 100'),
});

const col = createColumnHelper<InterchangeRow>();
const percent = (fraction: number) => formatMeasure(fraction * 100, '%');

function InterchangeTable({ rows }: { rows: InterchangeRow[] }) {
  const columns = useMemo(
    () => [
      col.accessor('brand', { header: 'Brand', enableSorting: true }),
      col.accessor('number', {
        header: 'Number',
        enableSorting: true,
        meta: { cellClassName: 'font-mono font-semibold whitespace-nowrap' },
      }),
      col.accessor('source', { header: 'Source', meta: { cellClassName: 'text-ink-soft' } }),
      col.accessor('confidence', {
        header: 'Sure',
        enableSorting: true,
        cell: ({ getValue }) => percent(getValue()),
        meta: { align: 'right', cellClassName: 'whitespace-nowrap' },
      }),
      col.display({
        id: 'verdict',
        header: 'Verdict',
        cell: ({ row: { original: r } }) =>
          r.check ? <VerdictBadge verdict={r.check.verdict} /> : <span className="text-sm text-ink-faint">not judged</span>,
      }),
    ],
    [],
  );
  return (
    <DataTable
      label="Interchange numbers"
      data={rows}
      columns={columns}
      getRowId={(r) => r.id}
      initialSorting={[{ id: 'brand', desc: false }]}
      empty="No other brand’s number leads to this part yet."
    />
  );
}

/**
 * The other brands' numbers this part stands in for, and a row to add one: the foreign brand,
 * its number, where the claim comes from and how sure it is.
 */
export function InterchangeSection({ detail, brands }: { detail: PartDetail; brands: readonly Brand[] }) {
  const { part, interchange } = detail;
  const form = useSchemaForm(rowFormSchema, {
    defaultValues: { brand: '', number: '', partId: part.id, source: 'manual', confidence: 100 },
  });
  const [saved, setSaved] = useState<{ changes: Change[]; at: Date; number: string } | null>(null);
  const create = useCreateInterchange();
  const { isDirty } = form.formState;
  const listId = `interchange-brands-${part.id}`;

  return (
    <Section title="Interchange">
      <InterchangeTable rows={interchange} />

      <Form
        form={form}
        aria-label="Add an interchange row"
        onSubmit={(body) =>
          create.mutate(body, {
            onSuccess: () => {
              setSaved({
                at: new Date(),
                number: body.number,
                changes: [
                  { what: 'Interchange', from: '—', to: `${body.brand} ${body.number} (${body.source}, ${percent(body.confidence)} sure)` },
                ],
              });
              // Brand, source and how sure often stay for the next number; the note goes once it is typed.
              form.reset({ ...form.getValues(), number: '' });
            },
          })
        }
        serverError={placedError(create.error)}
        className="flex flex-col gap-2 border-t border-ink/10 pt-3"
      >
        <p className="text-xs font-semibold tracking-wide text-ink-soft uppercase">Add a number that leads here</p>
        <div className="grid items-start gap-x-3 gap-y-2 sm:grid-cols-2 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_minmax(0,1fr)_9rem_auto]">
          <Field name="brand" label="Foreign brand" list={listId} maxLength={80} />
          <Field name="number" label="Their number" maxLength={60} className="font-mono" hint="as printed; spacing does not matter" />
          <Field name="source" label="Source" blank="absent" list={`${listId}-sources`} maxLength={60} />
          <Field name="confidence" label="How sure (%)" number hint="100: the maker's own" />
          <Button type="submit" disabled={create.isPending} className="lg:mt-[22px]">
            {create.isPending ? 'Adding…' : 'Add interchange row'}
          </Button>
        </div>
        <datalist id={listId}>
          {brands
            .filter((b) => b.name !== part.brand)
            .map((b) => (
              <option key={b.id} value={b.name} />
            ))}
        </datalist>
        <datalist id={`${listId}-sources`}>
          {SOURCES.map((s) => (
            <option key={s} value={s} />
          ))}
        </datalist>
      </Form>
      {saved && !isDirty && (
        <ChangeNote title="Interchange row added" changes={saved.changes} at={saved.at}>
          <p className="mt-1 text-sm text-ink-soft">
            {part.ours
              ? `Typing ${saved.number} at the Counter now finds ${part.partNumber}.`
              : `${part.brand} is not one of our lines, so the Counter does not list ${part.partNumber}.`}
          </p>
        </ChangeNote>
      )}
    </Section>
  );
}
