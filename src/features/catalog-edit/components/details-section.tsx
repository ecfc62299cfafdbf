import { useState, type FormEvent } from 'react';
import { partStatusSchema, updatePartBodySchema, type UpdatePartBody } from '@shared/schemas/parts';
import { issuesByPath } from '@/components/ui/field-errors';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorNote } from '@/components/ui/panel';
import type { PartDetail } from '@shared/schemas/parts';
import { useUpdatePart } from '../api/update-part';
import { partChanges, type Change } from '../changes';
import { fieldMessages, unplacedError } from '../field-messages';
import { ChangeNote } from './change-note';
import { Section } from './section';

const FIELDS = ['description', 'status', 'gtin'] as const;

/** Description, status and GTIN; only the fields that differ from the catalog are sent. */
export function DetailsSection({ detail }: { detail: PartDetail }) {
  const p = detail.part;
  const [description, setDescription] = useState(p.description);
  const [status, setStatus] = useState(p.status);
  const [gtin, setGtin] = useState(p.gtin ?? '');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState<{ changes: Change[]; at: Date } | null>(null);
  const update = useUpdatePart();
  const server = fieldMessages(update.error);
  const shown = { ...server, ...errors };

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const body: UpdatePartBody = {};
    if (description.trim() !== p.description) body.description = description;
    if (status !== p.status) body.status = status;
    const typedGtin = gtin.trim() === '' ? null : gtin.trim();
    if (typedGtin !== p.gtin) body.gtin = typedGtin;
    update.reset();
    if (Object.keys(body).length === 0) {
      setErrors({});
      setSaved({ changes: [], at: new Date() });
      return;
    }
    const checked = updatePartBodySchema.safeParse(body);
    if (!checked.success) {
      setErrors(issuesByPath(checked.error));
      setSaved(null);
      return;
    }
    setErrors({});
    update.mutate(
      { id: p.id, body: checked.data },
      { onSuccess: (after) => setSaved({ changes: partChanges(detail, after), at: new Date() }) },
    );
  };

  return (
    <Section title="Details">
      <form aria-label="Part details" onSubmit={submit} noValidate className="flex flex-col gap-3">
        <TextField
          label="Description"
          maxLength={500}
          value={description}
          onChange={(e) => setDescription(e.target.value)}
          error={shown.description}
        />
        <div className="grid gap-3 sm:grid-cols-2">
          <SelectField
            label="Status"
            value={status}
            onChange={(e) => setStatus(partStatusSchema.parse(e.target.value))}
            error={shown.status}
          >
            {partStatusSchema.options.map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </SelectField>
          <TextField
            label="GTIN"
            inputMode="numeric"
            maxLength={14}
            value={gtin}
            onChange={(e) => setGtin(e.target.value)}
            error={shown.gtin}
            hint="8, 12, 13 or 14 digits; empty removes it"
            className="font-mono"
          />
        </div>
        <ErrorNote error={unplacedError(update.error, server, FIELDS)} />
        <div>
          <Button type="submit" disabled={update.isPending}>
            {update.isPending ? 'Saving…' : 'Save details'}
          </Button>
        </div>
        {saved && <ChangeNote title={saved.changes.length ? 'Details saved' : 'Nothing to save'} changes={saved.changes} at={saved.at} />}
      </form>
    </Section>
  );
}
