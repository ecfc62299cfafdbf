import { createColumnHelper } from '@tanstack/react-table';
import { useEffect, useMemo, useRef } from 'react';
import { useFormContext, useWatch, type FieldErrors } from 'react-hook-form';
import { DEFAULT_SETTINGS, settingsSchema, type Settings } from '@shared/schemas/settings';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { controlClass } from '@/components/ui/field';
import { Field, Form, FormFieldFrame, useSchemaForm } from '@/components/ui/form';
import { Panel } from '@/components/ui/panel';
import { defaultAt, LOAD_POINT_COLUMNS, LOAD_POINT_ROWS, loadPointPath, SETTING_GROUPS, type SettingField } from '../settings-fields';

/** The default beside a figure, and whether the figure on screen differs from it. */
function DefaultNote({ path, unit, extra }: { path: string; unit?: string; extra?: string | undefined }) {
  const value: unknown = useWatch({ name: path });
  const changed = typeof value === 'number' && value !== Number(defaultAt(path));
  return (
    <>
      default {defaultAt(path)}
      {unit ? ` ${unit}` : ''}
      {changed && <span className="ml-1 font-semibold text-accent">· changed</span>}
      {extra ? ` · ${extra}` : ''}
    </>
  );
}

function NumberSetting({ field }: { field: SettingField }) {
  return (
    <Field
      name={field.path}
      label={field.label}
      unit={field.unit || undefined}
      number
      className="text-right"
      hint={<DefaultNote path={field.path} unit={field.unit} extra={field.hint} />}
    />
  );
}

type LoadPointRow = (typeof LOAD_POINT_ROWS)[number];
const col = createColumnHelper<LoadPointRow>();

/** Each load point's three figures, one row per engine condition. */
function LoadPointTable() {
  const columns = useMemo(
    () => [
      col.display({
        id: 'point',
        header: 'Load point',
        meta: { cellClassName: 'font-medium text-ink' },
        cell: ({ row: { original: r } }) => (
          <>
            {r.label}
            {r.key === 'boost' && <p className="text-xs font-normal text-ink-faint">only where the engine has boost</p>}
          </>
        ),
      }),
      ...LOAD_POINT_COLUMNS.map((c) =>
        col.display({
          id: c.key,
          header: () => (
            <>
              {c.label} <span className="normal-case">({c.unit})</span>
            </>
          ),
          cell: ({ row: { original: r } }) => {
            const path = loadPointPath(r.key, c.key);
            const aboveFull = r.key === 'boost' && c.key === 'mapKpa';
            return (
              // The column header shows what the figure is; the field's own label is for screen readers and messages.
              <div className="w-32 [&_label]:sr-only">
                <Field
                  name={path}
                  label={`${r.label}: ${aboveFull ? 'pressure above full load plus peak boost' : c.label.toLowerCase()}`}
                  unit={c.unit}
                  number
                  className="text-right"
                  hint={<DefaultNote path={path} extra={aboveFull ? 'above full + boost' : undefined} />}
                />
              </div>
            );
          },
        }),
      ),
    ],
    [],
  );
  return <DataTable label="Load points" data={[...LOAD_POINT_ROWS]} columns={columns} getRowId={(r) => r.key} />;
}

/** The store's name and contact, as printed on fit reports and shown on their share page. */
function StoreFields() {
  const { register } = useFormContext<Settings>();
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <Field name="store.name" label="Store name" maxLength={120} autoComplete="organization" />
      <Field name="store.phone" label="Phone" type="tel" maxLength={40} autoComplete="tel" />
      <FormFieldFrame name="store.address" label="Address" hint="Line breaks are kept." className="sm:col-span-2">
        {(ids) => (
          <textarea
            rows={3}
            maxLength={300}
            {...register('store.address')}
            {...ids}
            className={controlClass(ids['aria-invalid'] && 'invalid')}
          />
        )}
      </FormFieldFrame>
    </div>
  );
}

/** How many fields carry a message. */
function countErrors(errors: FieldErrors): number {
  let n = 0;
  for (const value of Object.values(errors)) {
    if (value === null || typeof value !== 'object') continue;
    n += typeof (value as { message?: unknown }).message === 'string' ? 1 : countErrors(value as FieldErrors);
  }
  return n;
}

/**
 * Every threshold and load point of the compatibility model, the price-list settings and the
 * store's details, grouped, each figure with its unit and its default. Checked with the API's
 * own schema before it is sent; the API's field messages are shown by their fields too.
 */
export function SettingsForm({
  initial,
  saving,
  saveError,
  saved,
  onSave,
}: {
  initial: Settings;
  saving: boolean;
  saveError: unknown;
  saved: boolean;
  onSave: (settings: Settings) => void;
}) {
  const form = useSchemaForm(settingsSchema, { defaultValues: initial });
  const { reset, getValues } = form;
  // Settings newly saved become what the form compares against ("Unsaved changes").
  const shownFor = useRef(initial);
  useEffect(() => {
    if (shownFor.current === initial) return;
    shownFor.current = initial;
    reset(initial);
  }, [initial, reset]);
  const { isDirty, errors, submitCount } = form.formState;
  const problems = submitCount > 0 || saveError ? countErrors(errors) : 0;

  return (
    <Form
      form={form}
      aria-label="Settings"
      onSubmit={onSave}
      serverError={saveError}
      serverFieldPrefix="settings"
      className="flex flex-col gap-4"
    >
      <div className="sticky top-0 z-10 flex flex-wrap items-center gap-3 rounded-lg border border-ink/10 bg-paper/95 px-4 py-2 backdrop-blur">
        <Button type="submit" disabled={saving}>
          {saving ? 'Saving…' : 'Save settings'}
        </Button>
        <Button
          variant="secondary"
          onClick={() =>
            // The thresholds and load points go back to the model's defaults; the store stays the store.
            reset({ ...DEFAULT_SETTINGS, store: getValues('store') }, { keepDefaultValues: true })
          }
        >
          Fill in the defaults
        </Button>
        <p role="status" className="text-sm">
          {problems > 0 ? (
            <span className="font-medium text-nogo">
              {problems} field{problems === 1 ? '' : 's'} need{problems === 1 ? 's' : ''} attention: nothing was saved.
            </span>
          ) : saved && !isDirty ? (
            <span className="font-medium text-go">Saved. New comparisons use these values.</span>
          ) : isDirty ? (
            <span className="text-ink-soft">Unsaved changes.</span>
          ) : null}
        </p>
      </div>

      <Panel title="Store">
        <p className="mb-3 text-sm text-ink-soft">The name and contact printed on fit reports and shown on their share page.</p>
        <StoreFields />
      </Panel>

      <div className="grid gap-4 lg:grid-cols-2">
        {SETTING_GROUPS.map((g) => (
          <Panel key={g.id} title={g.title}>
            {g.note && <p className="mb-3 text-sm text-ink-soft">{g.note}</p>}
            <div className="grid grid-cols-[repeat(auto-fill,minmax(13rem,1fr))] gap-x-4 gap-y-3">
              {g.fields.map((f) => (
                <NumberSetting key={f.path} field={f} />
              ))}
            </div>
          </Panel>
        ))}
      </div>

      <Panel title="Load points for required voltage">
        <p className="mb-2 text-sm text-ink-soft">
          The engine conditions at which required and available secondary voltage are compared. Boost&rsquo;s pressure is full load&rsquo;s
          plus the engine&rsquo;s peak boost plus the figure here.
        </p>
        <LoadPointTable />
      </Panel>
    </Form>
  );
}
