import { useId, useState, type FormEvent } from 'react';
import { DEFAULT_SETTINGS, type Settings } from '@shared/schemas/settings';
import { fieldErrorsOf } from '@/components/ui/field-errors';
import { Button } from '@/components/ui/button';
import { Panel } from '@/components/ui/panel';
import {
  defaultAt,
  settingsMessage,
  LOAD_POINT_COLUMNS,
  LOAD_POINT_ROWS,
  loadPointPath,
  parseSettings,
  SETTING_GROUPS,
  toText,
  type SettingField,
  type SettingsText,
} from '../settings-fields';

function NumberSetting({
  field,
  value,
  error,
  onChange,
}: {
  field: SettingField;
  value: string;
  error: string | undefined;
  onChange: (v: string) => void;
}) {
  const id = useId();
  const changed = value.trim() !== defaultAt(field.path);
  return (
    <div className="grid grid-cols-[minmax(0,1fr)_8rem] items-start gap-x-3 gap-y-0.5 border-b border-ink/10 py-2 last:border-b-0">
      <div>
        <label htmlFor={id} className="text-[15px] font-medium text-ink">
          {field.label}
          {field.unit && <span className="font-normal text-ink-soft"> ({field.unit})</span>}
        </label>
        <p className="text-xs text-ink-faint">
          default {defaultAt(field.path)}
          {field.unit ? ` ${field.unit}` : ''}
          {changed && <span className="ml-1 font-semibold text-accent">· changed</span>}
          {field.hint ? ` · ${field.hint}` : ''}
        </p>
      </div>
      <div>
        <input
          id={id}
          inputMode="decimal"
          value={value}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          onChange={(e) => onChange(e.target.value)}
          className={`w-full rounded-md border bg-paper-raised px-2.5 py-1.5 text-right text-[15px] tabular-nums text-ink focus:border-accent ${error ? 'border-nogo' : 'border-ink/20'}`}
        />
      </div>
      {error && (
        <p id={`${id}-error`} className="col-span-2 text-sm text-nogo">
          {error}
        </p>
      )}
    </div>
  );
}

function LoadPointGrid({
  text,
  errorOf,
  onChange,
}: {
  text: SettingsText;
  errorOf: (p: string) => string | undefined;
  onChange: (p: string, v: string) => void;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-[15px]">
        <thead>
          <tr className="border-b border-ink/15 text-left text-xs font-semibold uppercase tracking-wide text-ink-soft">
            <th scope="col" className="py-1.5 pr-3">
              Load point
            </th>
            {LOAD_POINT_COLUMNS.map((c) => (
              <th key={c.key} scope="col" className="py-1.5 pr-3">
                {c.label} <span className="font-normal normal-case">({c.unit})</span>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {LOAD_POINT_ROWS.map((r) => (
            <tr key={r.key} className="border-b border-ink/10 align-top">
              <th scope="row" className="py-2 pr-3 text-left font-medium text-ink">
                {r.label}
                {r.key === 'boost' && <p className="text-xs font-normal text-ink-faint">only where the engine has boost</p>}
              </th>
              {LOAD_POINT_COLUMNS.map((c) => {
                const path = loadPointPath(r.key, c.key);
                const error = errorOf(path);
                const label = `${r.label}: ${r.key === 'boost' && c.key === 'mapKpa' ? 'pressure above full load plus peak boost' : c.label.toLowerCase()} (${c.unit})`;
                return (
                  <td key={c.key} className="py-2 pr-3">
                    <input
                      aria-label={label}
                      inputMode="decimal"
                      value={text[path] ?? ''}
                      aria-invalid={error ? true : undefined}
                      onChange={(e) => onChange(path, e.target.value)}
                      className={`w-28 rounded-md border bg-paper-raised px-2.5 py-1.5 text-right tabular-nums text-ink focus:border-accent ${error ? 'border-nogo' : 'border-ink/20'}`}
                    />
                    <p className="text-xs text-ink-faint">
                      default {defaultAt(path)}
                      {r.key === 'boost' && c.key === 'mapKpa' ? ' above full + boost' : ''}
                    </p>
                    {error && <p className="text-sm text-nogo">{error}</p>}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/**
 * Every threshold and load point of the compatibility model and the price-list settings, grouped,
 * each with its unit and its default. Checked with the API's own schema before it is sent; the
 * API's field messages are shown by their fields too.
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
  const [text, setText] = useState<SettingsText>(() => toText(initial));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [dirty, setDirty] = useState(false);
  const server = fieldErrorsOf(saveError, 'settings');
  const errorOf = (path: string): string | undefined => {
    const message = errors[path] ?? (dirty ? undefined : server[path]);
    return message === undefined ? undefined : settingsMessage(message);
  };
  const change = (path: string, v: string) => {
    setText((t) => ({ ...t, [path]: v }));
    setErrors((e) => {
      const { [path]: _gone, ...rest } = e;
      return rest;
    });
    setDirty(true);
  };
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const r = parseSettings(text, initial);
    if (!r.ok) {
      setErrors(r.errors);
      return;
    }
    setErrors({});
    setDirty(false);
    onSave(r.settings);
  };
  const problems = Object.keys(errors).length + (dirty ? 0 : Object.keys(server).length);
  const unplacedServerError = saveError instanceof Error && Object.keys(server).length === 0 && !dirty ? saveError.message : null;

  return (
    <form aria-label="Settings" onSubmit={submit} noValidate className="flex flex-col gap-4">
      <div className="sticky top-0 z-10 flex flex-wrap items-center gap-3 rounded-lg border border-ink/10 bg-paper/95 px-4 py-2 backdrop-blur">
        <Button type="submit" disabled={saving}>
          {saving ? 'Saving…' : 'Save settings'}
        </Button>
        <Button
          variant="secondary"
          onClick={() => {
            setText(toText(DEFAULT_SETTINGS));
            setErrors({});
            setDirty(true);
          }}
        >
          Fill in the defaults
        </Button>
        <p role="status" className="text-sm">
          {problems > 0 ? (
            <span className="font-medium text-nogo">
              {problems} field{problems === 1 ? '' : 's'} need{problems === 1 ? 's' : ''} attention: nothing was saved.
            </span>
          ) : saved && !dirty ? (
            <span className="font-medium text-go">Saved. New comparisons use these values.</span>
          ) : dirty ? (
            <span className="text-ink-soft">Unsaved changes.</span>
          ) : null}
        </p>
        {unplacedServerError && (
          <p role="alert" className="basis-full text-sm text-nogo">
            {unplacedServerError}
          </p>
        )}
      </div>

      <div className="grid gap-4 lg:grid-cols-2">
        {SETTING_GROUPS.map((g) => (
          <Panel key={g.id} title={g.title}>
            {g.note && <p className="mb-1 text-sm text-ink-soft">{g.note}</p>}
            {g.fields.map((f) => (
              <NumberSetting
                key={f.path}
                field={f}
                value={text[f.path] ?? ''}
                error={errorOf(f.path)}
                onChange={(v) => change(f.path, v)}
              />
            ))}
          </Panel>
        ))}
      </div>

      <Panel title="Load points for required voltage">
        <p className="mb-2 text-sm text-ink-soft">
          The engine conditions at which required and available secondary voltage are compared. Boost&rsquo;s pressure is full load&rsquo;s
          plus the engine&rsquo;s peak boost plus the figure here.
        </p>
        <LoadPointGrid text={text} errorOf={errorOf} onChange={change} />
      </Panel>
    </form>
  );
}
