import { useState, type FormEvent } from 'react';
import { createInterchangeBodySchema } from '@shared/schemas/interchange';
import { issuesByPath } from '@/components/ui/field-errors';
import { VerdictBadge } from '@/features/compat/components/verdict-badge';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNote } from '@/components/ui/panel';
import { useCreateInterchange } from '../api/create-interchange';
import type { Brand } from '@shared/schemas/brands';
import type { PartDetail } from '@shared/schemas/parts';
import type { Change } from '../changes';
import { fieldMessages, unplacedError } from '../field-messages';
import { ChangeNote } from './change-note';
import { Section } from './section';
import { formatMeasure } from '@shared/format';

const FIELDS = ['brand', 'number', 'source', 'confidence'] as const;
const SOURCES = ['manual', 'supplier catalogue', 'maker cross-reference', 'bench-checked'];

/**
 * The other brands' numbers this part stands in for, and a row to add one: the foreign brand,
 * its number, where the claim comes from and how sure it is.
 */
export function InterchangeSection({ detail, brands }: { detail: PartDetail; brands: readonly Brand[] }) {
  const { part, interchange } = detail;
  const [brand, setBrand] = useState('');
  const [number, setNumber] = useState('');
  const [source, setSource] = useState('manual');
  const [confidence, setConfidence] = useState('100');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState<{ changes: Change[]; at: Date; number: string } | null>(null);
  const create = useCreateInterchange();
  const server = fieldMessages(create.error);
  const shown = { ...server, ...errors };
  const listId = `interchange-brands-${part.id}`;

  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.reset();
    const typed = confidence.trim().replace(',', '.');
    const checked = createInterchangeBodySchema.safeParse({
      brand,
      number,
      partId: part.id,
      source: source.trim() === '' ? undefined : source,
      confidence: typed === '' ? undefined : Number(typed) / 100,
    });
    if (!checked.success) {
      const found = issuesByPath(checked.error);
      if (found.brand) found.brand = brand.trim() === '' ? 'required' : found.brand;
      if (found.number) found.number = number.trim() === '' ? 'required' : found.number;
      if (found.confidence) found.confidence = 'a percentage from 0 to 100';
      setErrors(found);
      setSaved(null);
      return;
    }
    setErrors({});
    const body = checked.data;
    create.mutate(body, {
      onSuccess: () => {
        setSaved({
          at: new Date(),
          number: body.number,
          changes: [
            {
              what: 'Interchange',
              from: '—',
              to: `${body.brand} ${body.number} (${body.source}, ${formatMeasure(body.confidence * 100, '%')} sure)`,
            },
          ],
        });
        setNumber('');
      },
    });
  };

  return (
    <Section title="Interchange">
      {interchange.length === 0 ? (
        <p className="text-[15px] text-ink-soft">No other brand&rsquo;s number leads to this part yet.</p>
      ) : (
        <table className="w-full text-left text-[15px]" aria-label="Interchange numbers">
          <thead className="border-b border-ink/10 text-xs tracking-wide text-ink-soft uppercase">
            <tr>
              <th className="py-1 pr-3 font-semibold">Brand</th>
              <th className="py-1 pr-3 font-semibold">Number</th>
              <th className="py-1 pr-3 font-semibold">Source</th>
              <th className="py-1 pr-3 text-right font-semibold">Sure</th>
              <th className="py-1 font-semibold">Verdict</th>
            </tr>
          </thead>
          <tbody>
            {interchange.map((r) => (
              <tr key={r.id} className="border-b border-ink/5 last:border-b-0">
                <td className="py-1 pr-3">{r.brand}</td>
                <td className="py-1 pr-3 font-mono font-semibold whitespace-nowrap">{r.number}</td>
                <td className="py-1 pr-3 text-ink-soft">{r.source}</td>
                <td className="py-1 pr-3 text-right whitespace-nowrap tabular-nums">{formatMeasure(r.confidence * 100, '%')}</td>
                <td className="py-1">
                  {r.check ? <VerdictBadge verdict={r.check.verdict} /> : <span className="text-sm text-ink-faint">not judged</span>}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}

      <form aria-label="Add an interchange row" onSubmit={submit} noValidate className="flex flex-col gap-2 border-t border-ink/10 pt-3">
        <p className="text-xs font-semibold tracking-wide text-ink-soft uppercase">Add a number that leads here</p>
        <div className="grid items-start gap-x-3 gap-y-2 sm:grid-cols-2 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_minmax(0,1fr)_9rem_auto]">
          <TextField
            label="Foreign brand"
            list={listId}
            maxLength={80}
            value={brand}
            onChange={(e) => setBrand(e.target.value)}
            error={shown.brand}
          />
          <TextField
            label="Their number"
            maxLength={60}
            value={number}
            onChange={(e) => setNumber(e.target.value)}
            error={shown.number}
            className="font-mono"
            hint="as printed; spacing does not matter"
          />
          <TextField
            label="Source"
            list={`${listId}-sources`}
            maxLength={60}
            value={source}
            onChange={(e) => setSource(e.target.value)}
            error={shown.source}
          />
          <TextField
            label="How sure (%)"
            inputMode="decimal"
            value={confidence}
            onChange={(e) => setConfidence(e.target.value)}
            error={shown.confidence}
            hint="100: the maker's own"
          />
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
        <ErrorNote error={unplacedError(create.error, server, FIELDS)} />
      </form>
      {saved && (
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
