import { useState, type FormEvent } from 'react';
import { DEFAULT_COMPAT_SETTINGS } from '@shared/compat/settings';
import { fractionToPct } from '@shared/units';
import { benchBodySchema, type BenchBody } from '@shared/schemas/bench';
import { coilSpecSchema, type CoilSpec } from '@shared/schemas/specs';
import { Cautions } from '@/features/compat/components/cautions';
import { fieldErrorsOf, issuesByPath } from '@/components/ui/field-errors';
import { formatMeasure, formatRange } from '@shared/format';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Panel } from '@/components/ui/panel';
import { useCoil } from '../api/get-coil';
import { useRunBenchTest } from '../api/run-bench-test';
import { BenchResultView, type Readings } from './bench-result';
import { CoilSearch } from './coil-search';

/**
 * The API takes a whole coil spec; a bench test reads only its resistance windows, so a typed-in
 * window is sent with neutral figures for the rest (they do not enter the bench verdict).
 */
const WINDOW_ONLY: Omit<CoilSpec, 'primaryOhmMin' | 'primaryOhmMax' | 'secondaryKohmMin' | 'secondaryKohmMax'> = {
  architecture: 'coil-on-plug',
  driver: 'integrated',
  outputs: 1,
  connectorPins: 1,
  connectorKey: 'bench window',
  primaryInductanceMh: 1,
  turnsRatio: 100,
  availableKv: null,
  peakCurrentA: 1,
};

const WINDOW_FIELDS = ['primaryOhmMin', 'primaryOhmMax', 'secondaryKohmMin', 'secondaryKohmMax'] as const;
type WindowField = (typeof WINDOW_FIELDS)[number];
const WINDOW_LABELS: Record<WindowField, { label: string; unit: string }> = {
  primaryOhmMin: { label: 'Primary, min', unit: 'Ω' },
  primaryOhmMax: { label: 'Primary, max', unit: 'Ω' },
  secondaryKohmMin: { label: 'Secondary, min', unit: 'kΩ' },
  secondaryKohmMax: { label: 'Secondary, max', unit: 'kΩ' },
};

const num = (text: string): number | null => (text.trim() === '' ? null : Number(text.trim().replace(',', '.')));
const isCoilSpec = (spec: unknown): spec is CoilSpec => typeof spec === 'object' && spec !== null && 'primaryOhmMin' in spec;

/** Bench test: a coil's measured resistances, corrected to 20 °C, against its windows. */
export function BenchTest() {
  const [mode, setMode] = useState<'catalog' | 'window'>('catalog');
  const [partId, setPartId] = useState<string | null>(null);
  const [searching, setSearching] = useState(false);
  const [windowText, setWindowText] = useState<Record<WindowField, string>>({
    primaryOhmMin: '',
    primaryOhmMax: '',
    secondaryKohmMin: '',
    secondaryKohmMax: '',
  });
  const [primary, setPrimary] = useState('');
  const [open, setOpen] = useState(false);
  const [secondary, setSecondary] = useState('');
  const [temperature, setTemperature] = useState('20');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [readings, setReadings] = useState<Readings | null>(null);
  const coil = useCoil(mode === 'catalog' ? partId : null);
  const run = useRunBenchTest();
  const coilSpec = coil.data && isCoilSpec(coil.data.spec) ? coil.data.spec : null;

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const found: Record<string, string> = {};
    const measured = {
      primaryOhm: open ? null : num(primary),
      ...(secondary.trim() !== '' ? { secondaryKohm: num(secondary) } : {}),
      temperatureC: num(temperature),
    };
    if (!open && primary.trim() === '') found['measured.primaryOhm'] = 'enter the reading, or tick “no reading”';
    if (temperature.trim() === '') found['measured.temperatureC'] = 'required';
    let body: unknown;
    if (mode === 'catalog') {
      if (!partId) found.part = 'choose the coil first';
      body = { partId, measured };
    } else {
      const spec = { ...WINDOW_ONLY, ...Object.fromEntries(WINDOW_FIELDS.map((f) => [f, num(windowText[f])])) };
      const checked = coilSpecSchema.safeParse(spec);
      if (!checked.success) for (const [k, v] of Object.entries(issuesByPath(checked.error))) found[`spec.${k}`] ??= v;
      body = { spec, measured };
    }
    const parsed = benchBodySchema.safeParse(body);
    if (!parsed.success && Object.keys(found).length === 0) Object.assign(found, issuesByPath(parsed.error));
    setErrors(found);
    if (!parsed.success || Object.keys(found).length > 0) return;
    const sent: BenchBody = parsed.data;
    setReadings({
      primaryOhm: sent.measured.primaryOhm,
      secondaryKohm: sent.measured.secondaryKohm,
      temperatureC: sent.measured.temperatureC,
    });
    run.mutate(sent);
  };

  const server = { ...fieldErrorsOf(run.error, 'measured'), ...fieldErrorsOf(run.error) };
  const errorOf = (field: string): string | undefined =>
    errors[field] ?? server[field.replace(/^measured\./, '')] ?? (field === 'measured.temperatureC' ? server.coilTempC : undefined);
  const coilError = errors.part ?? server['coil.partId'] ?? server.partId;

  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-4 lg:grid-cols-2">
        <Panel
          title="Coil"
          actions={
            <div className="flex gap-1" role="group" aria-label="Coil: how to choose">
              {(['catalog', 'window'] as const).map((m) => (
                <button
                  key={m}
                  type="button"
                  aria-pressed={mode === m}
                  onClick={() => {
                    setMode(m);
                    run.reset();
                  }}
                  className={`rounded-md px-2.5 py-1 text-sm font-medium ${mode === m ? 'bg-accent text-white' : 'text-ink-soft hover:bg-paper-sunk'}`}
                >
                  {m === 'catalog' ? 'From the catalog' : 'Type the window'}
                </button>
              ))}
            </div>
          }
        >
          {mode === 'catalog' ? (
            <div className="flex flex-col gap-3">
              {(!partId || searching) && (
                <CoilSearch
                  onPick={(h) => {
                    setPartId(h.partId);
                    setSearching(false);
                    run.reset();
                  }}
                />
              )}
              {coilError && <p className="text-sm text-nogo">{coilError}</p>}
              {coil.data && !searching && (
                <div className="rounded-md border border-ink/10 bg-paper px-3 py-2">
                  <div className="flex items-baseline justify-between gap-2">
                    <p className="text-lg font-semibold text-ink" data-testid="bench-coil">
                      {coil.data.part.brand} {coil.data.part.partNumber}
                    </p>
                    <Button variant="ghost" onClick={() => setSearching(true)}>
                      Change
                    </Button>
                  </div>
                  <p className="text-sm text-ink-soft">{coil.data.part.description}</p>
                  {coilSpec ? (
                    <p className="mt-1 text-[15px] tabular-nums text-ink">
                      Primary {formatRange(coilSpec.primaryOhmMin, coilSpec.primaryOhmMax, 'Ω')} · secondary{' '}
                      {coilSpec.secondaryKohmMin != null && coilSpec.secondaryKohmMax != null
                        ? formatRange(coilSpec.secondaryKohmMin, coilSpec.secondaryKohmMax, 'kΩ')
                        : 'not stated'}{' '}
                      (at 20&nbsp;°C)
                    </p>
                  ) : (
                    <p className="mt-1 text-sm text-review">No coil spec on file: type the window instead.</p>
                  )}
                </div>
              )}
            </div>
          ) : (
            <div className="grid grid-cols-2 gap-3">
              {WINDOW_FIELDS.map((f) => (
                <TextField
                  key={f}
                  label={WINDOW_LABELS[f].label}
                  unit={WINDOW_LABELS[f].unit}
                  value={windowText[f]}
                  onChange={(e) => setWindowText((w) => ({ ...w, [f]: e.target.value }))}
                  hint={f.startsWith('secondary') ? 'optional; at 20 °C' : 'at 20 °C'}
                  error={errors[`spec.${f}`] ?? server[`spec.${f}`]}
                />
              ))}
            </div>
          )}
        </Panel>

        <Panel title="Readings">
          <form aria-label="Bench readings" onSubmit={submit} noValidate className="flex flex-col gap-3">
            <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
              <div className="flex flex-col gap-1.5">
                <TextField
                  label="Primary"
                  unit="Ω"
                  value={open ? '' : primary}
                  disabled={open}
                  onChange={(e) => setPrimary(e.target.value)}
                  error={errorOf('measured.primaryOhm')}
                />
                <label className="flex items-center gap-2 text-sm text-ink">
                  <input type="checkbox" checked={open} onChange={(e) => setOpen(e.target.checked)} className="h-4 w-4 accent-accent" />
                  No reading (open)
                </label>
              </div>
              <TextField
                label="Secondary"
                unit="kΩ"
                value={secondary}
                onChange={(e) => setSecondary(e.target.value)}
                hint="optional"
                error={errorOf('measured.secondaryKohm')}
              />
              <TextField
                label="Coil temperature"
                unit="°C"
                value={temperature}
                onChange={(e) => setTemperature(e.target.value)}
                hint="of the winding, when read"
                error={errorOf('measured.temperatureC')}
              />
            </div>
            <div>
              <Button type="submit" disabled={run.isPending}>
                {run.isPending ? 'Checking…' : 'Check readings'}
              </Button>
            </div>
          </form>
        </Panel>
      </div>

      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,26rem)]">
        <Panel title="Result">
          {run.error && (
            <p role="alert" className="mb-2 rounded-md border border-nogo/30 bg-nogo-soft px-3 py-2 text-sm text-nogo">
              No verdict: {run.error.message}
            </p>
          )}
          {run.data && readings ? (
            <BenchResultView result={run.data} readings={readings} />
          ) : (
            <p className="text-ink-soft">
              Choose the coil, enter the readings and the coil&rsquo;s temperature. A copper winding reads about{' '}
              {formatMeasure(fractionToPct(DEFAULT_COMPAT_SETTINGS.copperAlphaPerK), '%', 2)} more for every °C above 20&nbsp;°C, so the
              readings are corrected to 20&nbsp;°C before they are judged.
            </p>
          )}
        </Panel>
        <Cautions cautions={run.data?.cautions.length ? run.data.cautions : undefined} />
      </div>
    </div>
  );
}
