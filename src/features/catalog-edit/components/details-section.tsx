import { useState } from 'react';
import { partStatusSchema, updatePartBodySchema, type PartDetail, type UpdatePartBody } from '@shared/schemas/parts';
import { Button } from '@/components/ui/button';
import { Field, FieldSelect, Form, useSchemaForm } from '@/components/ui/form';
import { useUpdatePart } from '../api/update-part';
import { partChanges, type Change } from '../changes';
import { placedError } from '../field-messages';
import { ChangeNote } from './change-note';
import { Section } from './section';

const valuesOf = ({ part }: PartDetail) => ({ description: part.description, status: part.status, gtin: part.gtin });

/** Description, status and GTIN; only the fields that differ from the catalog are sent. */
export function DetailsSection({ detail }: { detail: PartDetail }) {
  const form = useSchemaForm(updatePartBodySchema, { defaultValues: valuesOf(detail) });
  const [saved, setSaved] = useState<{ changes: Change[]; at: Date } | null>(null);
  const update = useUpdatePart();
  const { isDirty } = form.formState;
  const p = detail.part;

  const submit = (values: UpdatePartBody) => {
    const body: UpdatePartBody = {};
    if (values.description !== undefined && values.description !== p.description) body.description = values.description;
    if (values.status !== undefined && values.status !== p.status) body.status = values.status;
    if (values.gtin !== undefined && values.gtin !== p.gtin) body.gtin = values.gtin;
    update.reset();
    if (Object.keys(body).length === 0) {
      form.reset(valuesOf(detail));
      setSaved({ changes: [], at: new Date() });
      return;
    }
    update.mutate(
      { id: p.id, body },
      {
        onSuccess: (after) => {
          // The form shows the part as saved; the note goes once it is edited again.
          form.reset(valuesOf(after));
          setSaved({ changes: partChanges(detail, after), at: new Date() });
        },
      },
    );
  };

  return (
    <Section title="Details">
      <Form form={form} aria-label="Part details" onSubmit={submit} serverError={placedError(update.error)} className="flex flex-col gap-3">
        <Field name="description" label="Description" maxLength={500} />
        <div className="grid gap-3 sm:grid-cols-2">
          <FieldSelect name="status" label="Status" options={partStatusSchema.options} />
          <Field
            name="gtin"
            label="GTIN"
            blank="null"
            inputMode="numeric"
            maxLength={14}
            hint="8, 12, 13 or 14 digits; empty removes it"
            className="font-mono"
          />
        </div>
        <div>
          <Button type="submit" disabled={update.isPending}>
            {update.isPending ? 'Saving…' : 'Save details'}
          </Button>
        </div>
        {saved && !isDirty && (
          <ChangeNote title={saved.changes.length ? 'Details saved' : 'Nothing to save'} changes={saved.changes} at={saved.at} />
        )}
      </Form>
    </Section>
  );
}
