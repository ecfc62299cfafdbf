import { useState } from 'react';
import { Controller, get, type FieldErrors } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { labelledMessage } from '@/components/ui/field-errors';
import { Field, FieldCheckbox, Form, useSchemaForm } from '@/components/ui/form';
import { useCreateBrand } from '../api/create-brand';
import type { Change } from '../changes';
import { placedError } from '../field-messages';
import { brandFormSchema, type HeatRow, type RowErrors } from '../heat-table';
import { ChangeNote } from './change-note';
import { HeatTableEditor } from './heat-table-editor';

type BrandForm = z.input<typeof brandFormSchema>;

const EMPTY: BrandForm = { name: '', ours: false, heatCodeNote: null, heatCodes: [] };

const messageAt = (errors: FieldErrors<BrandForm>, path: string): string | undefined => {
  const m = (get(errors, path) as { message?: unknown } | undefined)?.message;
  return typeof m === 'string' ? m : undefined;
};

/** The schema's messages on the heat table: each row's by its key, and one for the whole table. */
function tableErrors(errors: FieldErrors<BrandForm>, rows: readonly HeatRow[]): { rows: Record<number, RowErrors>; table: string | null } {
  const byRow: Record<number, RowErrors> = {};
  rows.forEach((r, i) => {
    const code = messageAt(errors, `heatCodes.${i}.code`);
    const step = messageAt(errors, `heatCodes.${i}.step`) ?? messageAt(errors, `heatCodes.${i}.heatStep`);
    if (code || step) byRow[r.key] = { ...(code ? { code } : {}), ...(step ? { step } : {}) };
  });
  const whole = messageAt(errors, 'heatCodes') ?? messageAt(errors, 'heatCodes.root');
  const table = whole ? labelledMessage('Heat table', whole) : Object.keys(byRow).length ? 'some heat codes need attention' : null;
  return { rows: byRow, table };
}

/** Adds a brand with its heat table: the codes it prints on its plugs and the heat step each stands for. */
export function BrandForm() {
  const form = useSchemaForm(brandFormSchema, { defaultValues: EMPTY });
  const [saved, setSaved] = useState<{ changes: Change[]; at: Date } | null>(null);
  // Remounting the table editor after an add clears its run filler too.
  const [round, setRound] = useState(0);
  const create = useCreateBrand();
  const { isDirty, errors } = form.formState;

  return (
    <Form
      form={form}
      aria-label="Add a brand"
      onSubmit={(body) =>
        create.mutate(body, {
          onSuccess: (brand) => {
            const sorted = [...body.heatCodes].sort((a, b) => a.heatStep - b.heatStep);
            setSaved({
              at: new Date(),
              changes: [
                { what: 'Brand', from: '—', to: brand.name },
                { what: 'Line', from: '—', to: body.ours ? 'ours (sold at the Counter)' : 'another maker’s' },
                {
                  what: 'Heat table (code → step)',
                  from: '—',
                  to: sorted.length ? sorted.map((h) => `${h.code} → ${h.heatStep}`).join(', ') : 'none',
                },
                ...(body.heatCodeNote ? [{ what: 'Note', from: '—', to: body.heatCodeNote }] : []),
              ],
            });
            form.reset(EMPTY);
            setRound((r) => r + 1);
          },
        })
      }
      serverError={placedError(create.error)}
      className="flex flex-col gap-3"
    >
      <Field name="name" label="Brand name" maxLength={80} />
      <FieldCheckbox
        name="ours"
        label="One of our lines"
        hint="The Counter sells our lines’ parts. Leave it off for another maker whose numbers and specs we only cross-reference."
      />
      <Field
        name="heatCodeNote"
        label="Which way the codes run"
        blank="null"
        maxLength={200}
        placeholder="e.g. Numbered 2–9; a higher number is a colder plug."
        hint="Shown beside the heat table, as the brand's own catalogue puts it."
      />
      <fieldset className="flex min-w-0 flex-col gap-2">
        <legend className="mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">Heat table</legend>
        <Controller
          control={form.control}
          name="heatCodes"
          render={({ field }) => {
            const rows = field.value as HeatRow[];
            const shown = tableErrors(errors, rows);
            return <HeatTableEditor key={round} rows={rows} errors={shown.rows} tableError={shown.table} onChange={field.onChange} />;
          }}
        />
      </fieldset>
      <div>
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? 'Adding…' : 'Add brand'}
        </Button>
      </div>
      {/* Said of the brand just added, until the next one is typed. */}
      {saved && !isDirty && <ChangeNote title="Brand added" changes={saved.changes} at={saved.at} />}
    </Form>
  );
}
