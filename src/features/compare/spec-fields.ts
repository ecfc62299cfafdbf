import type { z } from 'zod';
import {
  COIL_ARCHITECTURES,
  COIL_DRIVERS,
  coilSpecSchema,
  HEAT_STEP_MAX,
  HEAT_STEP_MIN,
  PLUG_ELECTRODES,
  PLUG_SEATS,
  resolvedPlugSpecSchema,
  type CoilSpec,
  type PartKind,
  type ResolvedPlugSpec,
} from '@shared/schemas/specs';
import { inFormWords, issuesByPath } from '@/components/compat/field-errors';

/**
 * The typed-in spec forms: one field per spec field of shared/schemas/specs.ts, with its unit.
 * The form holds text (what the person typed); `parseSpec` turns it into a spec through the same
 * zod schema the API validates with, so the client and the server agree on what is valid.
 */

export type FieldDef =
  | { name: string; label: string; type: 'number' | 'integer'; unit?: string; optional?: boolean; hint?: string }
  | { name: string; label: string; type: 'text'; optional?: boolean; hint?: string }
  | { name: string; label: string; type: 'select'; options: readonly string[] }
  | { name: string; label: string; type: 'checkbox' };

export type FormValues = Record<string, string | boolean>;

export const COIL_FIELDS: readonly FieldDef[] = [
  { name: 'architecture', label: 'Architecture', type: 'select', options: COIL_ARCHITECTURES },
  { name: 'driver', label: 'Driver', type: 'select', options: COIL_DRIVERS },
  { name: 'outputs', label: 'Outputs (towers)', type: 'integer' },
  { name: 'connectorPins', label: 'Connector pins', type: 'integer' },
  { name: 'connectorKey', label: 'Connector key', type: 'text' },
  { name: 'primaryOhmMin', label: 'Primary resistance, min', type: 'number', unit: 'Ω', hint: 'at 20 °C' },
  { name: 'primaryOhmMax', label: 'Primary resistance, max', type: 'number', unit: 'Ω', hint: 'at 20 °C' },
  { name: 'primaryInductanceMh', label: 'Primary inductance', type: 'number', unit: 'mH' },
  { name: 'secondaryKohmMin', label: 'Secondary resistance, min', type: 'number', unit: 'kΩ', optional: true },
  { name: 'secondaryKohmMax', label: 'Secondary resistance, max', type: 'number', unit: 'kΩ', optional: true },
  { name: 'turnsRatio', label: 'Turns ratio Ns/Np', type: 'number', unit: ':1' },
  {
    name: 'availableKv',
    label: 'Rated available voltage',
    type: 'number',
    unit: 'kV',
    optional: true,
    hint: 'empty: estimated from the turns ratio',
  },
  { name: 'peakCurrentA', label: 'Rated peak primary current', type: 'number', unit: 'A' },
];

export const PLUG_FIELDS: readonly FieldDef[] = [
  { name: 'threadMm', label: 'Thread diameter', type: 'number', unit: 'mm' },
  { name: 'threadPitchMm', label: 'Thread pitch', type: 'number', unit: 'mm' },
  { name: 'reachMm', label: 'Reach', type: 'number', unit: 'mm' },
  { name: 'seat', label: 'Seat', type: 'select', options: PLUG_SEATS },
  { name: 'hexMm', label: 'Hex', type: 'number', unit: 'mm' },
  { name: 'heatStep', label: 'Heat step', type: 'integer', hint: `${HEAT_STEP_MIN} hottest … ${HEAT_STEP_MAX} coldest` },
  { name: 'heatCode', label: 'Brand heat code', type: 'text', optional: true, hint: 'for the record only' },
  { name: 'gapMm', label: 'Gap as supplied', type: 'number', unit: 'mm' },
  { name: 'regappable', label: 'May be regapped', type: 'checkbox' },
  { name: 'resistor', label: 'Resistor', type: 'checkbox' },
  { name: 'resistorKohm', label: 'Resistor value', type: 'number', unit: 'kΩ', optional: true },
  { name: 'projectedTip', label: 'Projected tip', type: 'checkbox' },
  { name: 'electrode', label: 'Electrode', type: 'select', options: PLUG_ELECTRODES },
];

export const fieldsFor = (kind: PartKind): readonly FieldDef[] => (kind === 'coil' ? COIL_FIELDS : PLUG_FIELDS);

/** Empty form values for a kind: selects on their first option, checkboxes off. */
export function emptyValues(kind: PartKind): FormValues {
  const values: FormValues = {};
  for (const f of fieldsFor(kind)) {
    if (f.type === 'select') values[f.name] = f.options[0] ?? '';
    else if (f.type === 'checkbox') values[f.name] = false;
    else values[f.name] = '';
  }
  return values;
}

/** A known spec as form values, to start typing from. */
export function valuesOf(kind: PartKind, spec: CoilSpec | ResolvedPlugSpec): FormValues {
  const values = emptyValues(kind);
  const record = spec as Record<string, unknown>;
  for (const f of fieldsFor(kind)) {
    const v = record[f.name];
    if (typeof v === 'boolean') values[f.name] = v;
    else if (typeof v === 'number' || typeof v === 'string') values[f.name] = String(v);
  }
  return values;
}

function toInput(kind: PartKind, values: FormValues): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const f of fieldsFor(kind)) {
    const v = values[f.name];
    if (f.type === 'checkbox') out[f.name] = v === true;
    else if (f.type === 'select') out[f.name] = v;
    else {
      const text = typeof v === 'string' ? v.trim() : '';
      if (text === '') out[f.name] = 'optional' in f && f.optional ? null : undefined;
      // A comma is a decimal point on many keyboards' layouts.
      else out[f.name] = f.type === 'text' ? text : Number(text.replace(',', '.'));
    }
  }
  return out;
}

export type SpecParse<S> = { ok: true; spec: S } | { ok: false; errors: Record<string, string> };

const LABEL_BY_NAME = new Map([...COIL_FIELDS, ...PLUG_FIELDS].map((f) => [f.name, f.label] as const));

/** A schema message with the form's labels for the field names it writes. */
export const specMessage = (message: string): string => inFormWords(message, (key) => LABEL_BY_NAME.get(key));

function friendly(result: z.ZodSafeParseError<unknown>, input: Record<string, unknown>): Record<string, string> {
  const errors = Object.fromEntries(Object.entries(issuesByPath(result.error)).map(([k, v]) => [k, specMessage(v)]));
  for (const key of Object.keys(errors)) {
    if (input[key] === undefined) errors[key] = 'required';
    else if (typeof input[key] === 'number' && Number.isNaN(input[key])) errors[key] = 'not a number';
  }
  return errors;
}

export function parseCoilSpec(values: FormValues): SpecParse<CoilSpec> {
  const input = toInput('coil', values);
  const r = coilSpecSchema.safeParse(input);
  return r.success ? { ok: true, spec: r.data } : { ok: false, errors: friendly(r, input) };
}

export function parsePlugSpec(values: FormValues): SpecParse<ResolvedPlugSpec> {
  const input = toInput('plug', values);
  const r = resolvedPlugSpecSchema.safeParse(input);
  return r.success ? { ok: true, spec: r.data } : { ok: false, errors: friendly(r, input) };
}
