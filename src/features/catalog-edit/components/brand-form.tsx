import { useId, useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNote } from '@/components/ui/panel';
import { useCreateBrand } from '../api/create-brand';
import type { Change } from '../changes';
import { fieldMessages, unplacedError } from '../field-messages';
import { parseBrand, type HeatRow, type RowErrors } from '../heat-table';
import { ChangeNote } from './change-note';
import { HeatTableEditor } from './heat-table-editor';

const FIELDS = ['name', 'ours', 'heatCodeNote', 'heatCodes'] as const;

/** Adds a brand with its heat table: the codes it prints on its plugs and the heat step each stands for. */
export function BrandForm() {
  const [name, setName] = useState('');
  const [ours, setOurs] = useState(false);
  const [note, setNote] = useState('');
  const [rows, setRows] = useState<HeatRow[]>([]);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const [rowErrors, setRowErrors] = useState<Record<number, RowErrors>>({});
  const [tableError, setTableError] = useState<string | null>(null);
  const [saved, setSaved] = useState<{ changes: Change[]; at: Date } | null>(null);
  // Remounting the table editor after an add clears its run filler too.
  const [round, setRound] = useState(0);
  const create = useCreateBrand();
  const oursId = useId();

  const server = fieldMessages(create.error);
  const shown = { ...server, ...fieldErrors };

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const parsed = parseBrand({ name, ours, note, rows });
    if (!parsed.ok) {
      setFieldErrors(parsed.fields);
      setRowErrors(parsed.rows);
      setTableError(parsed.table ?? (Object.keys(parsed.rows).length ? 'some heat codes need attention' : null));
      return;
    }
    setFieldErrors({});
    setRowErrors({});
    setTableError(null);
    const body = parsed.body;
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
        setName('');
        setOurs(false);
        setNote('');
        setRows([]);
        setRound((r) => r + 1);
      },
    });
  };

  return (
    <form aria-label="Add a brand" onSubmit={submit} noValidate className="flex flex-col gap-3">
      <TextField
        label="Brand name"
        maxLength={80}
        value={name}
        onChange={(e) => {
          setName(e.target.value);
          setSaved(null);
        }}
        error={shown.name}
      />
      <div className="flex items-start gap-2">
        <input
          id={oursId}
          type="checkbox"
          checked={ours}
          onChange={(e) => setOurs(e.target.checked)}
          className="mt-1 h-4 w-4 accent-accent"
        />
        <label htmlFor={oursId} className="text-[15px] text-ink">
          One of our lines
          <span className="block text-xs text-ink-faint">
            The Counter sells our lines&rsquo; parts. Leave it off for another maker whose numbers and specs we only cross-reference.
          </span>
        </label>
      </div>
      <TextField
        label="Which way the codes run"
        maxLength={200}
        placeholder="e.g. Numbered 2–9; a higher number is a colder plug."
        value={note}
        onChange={(e) => setNote(e.target.value)}
        error={shown.heatCodeNote}
        hint="Shown beside the heat table, as the brand's own catalogue puts it."
      />
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">Heat table</legend>
        <HeatTableEditor key={round} rows={rows} errors={rowErrors} tableError={tableError ?? shown.heatCodes ?? null} onChange={setRows} />
      </fieldset>
      <ErrorNote error={unplacedError(create.error, server, FIELDS)} />
      <div>
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? 'Adding…' : 'Add brand'}
        </Button>
      </div>
      {saved && <ChangeNote title="Brand added" changes={saved.changes} at={saved.at} />}
    </form>
  );
}
