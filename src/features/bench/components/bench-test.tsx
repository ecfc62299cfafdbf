import { useState, type ReactNode } from 'react';
import { useFormContext, useWatch, type FieldValues, type UseFormReturn } from 'react-hook-form';
import { DEFAULT_COMPAT_SETTINGS } from '@shared/compat/settings';
import { formatMeasure, formatRange } from '@shared/format';
import { benchByPartSchema, benchBySpecSchema, type BenchBody } from '@shared/schemas/bench';
import { isCoilSpec, type CoilSpec } from '@shared/schemas/specs';
import { specField, specLabel, specQuantity } from '@shared/spec-fields';
import { fractionToPct } from '@shared/units';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Field, Form, useFieldError, useResultIsCurrent, useSchemaForm } from '@/components/ui/form';
import { Panel } from '@/components/ui/panel';
import { Cautions } from '@/features/compat/components/cautions';
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

type Mode = 'catalog' | 'window';
/** The readings as typed so far: carried over when the coil is chosen another way. */
type Typed = Partial<Readings>;

const START: Typed = { temperatureC: 20 };

/** Bench test: a coil's measured resistances, corrected to 20 °C, against its windows. */
export function BenchTest() {
  const [mode, setMode] = useState<Mode>('catalog');
  const [typed, setTyped] = useState<Typed>(START);
  const switchTo = (next: Mode, readings: Typed) => {
    setTyped(readings);
    setMode(next);
  };
  return mode === 'catalog' ? <CatalogBench readings={typed} onMode={switchTo} /> : <WindowBench readings={typed} onMode={switchTo} />;
}

interface BenchProps {
  readings: Typed;
  onMode: (mode: Mode, readings: Typed) => void;
}

function CatalogBench({ readings, onMode }: BenchProps) {
  const form = useSchemaForm(benchByPartSchema, { defaultValues: { measured: readings } });
  const partId = useWatch({ control: form.control, name: 'partId' }) ?? null;
  const [searching, setSearching] = useState(false);
  const coil = useCoil(partId);
  const coilSpec = coil.data?.spec && isCoilSpec(coil.data.spec) ? coil.data.spec : null;
  return (
    <BenchLayout form={form} mode="catalog" onMode={onMode}>
      <div className="flex flex-col gap-3">
        {(!partId || searching) && (
          <CoilSearch
            onPick={(h) => {
              form.setValue('partId', h.partId, { shouldDirty: true, shouldValidate: form.formState.isSubmitted });
              setSearching(false);
            }}
          />
        )}
        <FieldMessage name="partId" label="Coil" />
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
    </BenchLayout>
  );
}

function WindowBench({ readings, onMode }: BenchProps) {
  const form = useSchemaForm(benchBySpecSchema, { defaultValues: { spec: WINDOW_ONLY, measured: readings } });
  return (
    <BenchLayout form={form} mode="window" onMode={onMode}>
      <div className="grid grid-cols-2 gap-3">
        {WINDOW_FIELDS.map((f) => {
          const def = specField(f);
          return (
            <Field
              key={f}
              name={`spec.${f}`}
              label={specLabel(f)}
              unit={def?.unit}
              number
              hint={def?.optional ? `optional; ${def.hint ?? 'at 20 °C'}` : (def?.hint ?? 'at 20 °C')}
            />
          );
        })}
      </div>
    </BenchLayout>
  );
}

/** A message of the enclosing form for a value with no input of its own (the coil, chosen by a search). */
function FieldMessage({ name, label }: { name: string; label: string }) {
  const error = useFieldError(name, label);
  return error ? (
    <p role="alert" className="text-sm text-nogo">
      {error}
    </p>
  ) : null;
}

/**
 * The bench page around one way of choosing the coil: the coil, the readings, the result. The
 * result is shown only while it belongs to the inputs on screen; a change clears it.
 */
function BenchLayout<TIn extends FieldValues, TOut extends BenchBody>({
  form,
  mode,
  onMode,
  children,
}: {
  form: UseFormReturn<TIn, unknown, TOut>;
  mode: Mode;
  onMode: (mode: Mode, readings: Typed) => void;
  children: ReactNode;
}) {
  const run = useRunBenchTest();
  const { isCurrent, shown } = useResultIsCurrent(form);
  const result = run.data && run.variables && isCurrent ? { data: run.data, readings: run.variables.measured } : null;
  const outOfDate = run.data !== undefined && !isCurrent;

  return (
    <Form
      form={form}
      aria-label="Bench test"
      onSubmit={(body) => {
        shown();
        run.mutate(body);
      }}
      serverError={run.error}
      className="flex flex-col gap-4"
    >
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 lg:grid-cols-2">
        <Panel
          title="Coil"
          actions={
            <div className="flex gap-1" role="group" aria-label="Coil: how to choose">
              {(['catalog', 'window'] as const).map((m) => (
                <button
                  key={m}
                  type="button"
                  aria-pressed={mode === m}
                  onClick={() => m !== mode && onMode(m, (form.getValues() as { measured?: Typed }).measured ?? START)}
                  className={`rounded-md px-2.5 py-1 text-sm font-medium ${mode === m ? 'bg-accent text-white' : 'text-ink-soft hover:bg-paper-sunk'}`}
                >
                  {m === 'catalog' ? 'From the catalog' : 'Type the window'}
                </button>
              ))}
            </div>
          }
        >
          {children}
        </Panel>

        <Panel title="Readings">
          <div role="group" aria-label="Bench readings" className="flex flex-col gap-3">
            <ReadingFields />
            <div>
              <Button type="submit" disabled={run.isPending}>
                {run.isPending ? 'Checking…' : 'Check readings'}
              </Button>
            </div>
          </div>
        </Panel>
      </div>

      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,26rem)]">
        <Panel title="Result">
          {result ? (
            <BenchResultView result={result.data} readings={result.readings} />
          ) : outOfDate ? (
            <p
              role="status"
              className="rounded-md border border-review/40 bg-review-soft px-3 py-2 text-review"
              data-testid="bench-out-of-date"
            >
              The inputs changed since the last check: press Check readings for a verdict on what is shown.
            </p>
          ) : (
            <p className="text-ink-soft">
              Choose the coil, enter the readings and the coil&rsquo;s temperature. A copper winding reads about{' '}
              {formatMeasure(fractionToPct(DEFAULT_COMPAT_SETTINGS.copperAlphaPerK), '%', 2)} more for every °C above 20&nbsp;°C, so the
              readings are corrected to 20&nbsp;°C before they are judged.
            </p>
          )}
        </Panel>
        <Cautions cautions={result?.data.cautions.length ? result.data.cautions : undefined} />
      </div>
    </Form>
  );
}

const PRIMARY = 'measured.primaryOhm';

/** The meter's readings: primary (or "no reading"), secondary (optional), the winding's temperature. */
function ReadingFields() {
  const { control, setValue, formState } = useFormContext();
  const primary: unknown = useWatch({ control, name: PRIMARY });
  const open = primary === null;
  const primaryLabel = specQuantity('primaryOhmMin');
  return (
    <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
      <div className="flex flex-col gap-1.5">
        {open ? (
          <TextField label={primaryLabel} unit="Ω" value="" disabled />
        ) : (
          <Field name={PRIMARY} label={primaryLabel} unit="Ω" number />
        )}
        <label className="flex items-center gap-2 text-sm text-ink">
          <input
            type="checkbox"
            checked={open}
            onChange={(e) =>
              setValue(PRIMARY, e.target.checked ? null : undefined, { shouldDirty: true, shouldValidate: formState.isSubmitted })
            }
            className="h-4 w-4 accent-accent"
          />
          No reading (open)
        </label>
      </div>
      <Field name="measured.secondaryKohm" label={specQuantity('secondaryKohmMin')} unit="kΩ" number hint="optional" />
      <Field name="measured.temperatureC" label="Temperature" unit="°C" number hint="of the winding, when read" />
    </div>
  );
}
