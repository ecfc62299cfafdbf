import type { z } from 'zod';
import {
  COIL_ARCHITECTURES,
  COIL_DRIVERS,
  coilSpecSchema,
  PLUG_ELECTRODES,
  PLUG_SEATS,
  plugSpecSchema,
  type CoilSpec,
  type PartKind,
  type PlugSpec,
  type ResolvedPlugSpec,
} from '@shared/schemas/specs';
import { inFormWords } from '@/components/compat/field-errors';
import { formatMeasure } from '@/components/compat/format';

/**
 * The spec of a catalog part as the buyer types it: one field per stored spec field of
 * shared/schemas/specs.ts, each with its unit. A plug's heat is its brand's own heat code, chosen
 * from the brand's heat table (the server maps it onto the heat step). The form holds text;
 * `parseSpec` turns it into a spec through the schema the API validates with.
 */

export type SpecField =
  | { name: string; label: string; type: 'number' | 'integer'; unit?: string; optional?: boolean; hint?: string }
  | { name: string; label: string; type: 'text'; hint?: string }
  | { name: string; label: string; type: 'select'; options: readonly string[] }
  | { name: string; label: string; type: 'checkbox' }
  | { name: 'heatCode'; label: string; type: 'heat-code' };

export type SpecValues = Record<string, string | boolean>;
export type ShownSpec = CoilSpec | ResolvedPlugSpec;

export const COIL_SPEC_FIELDS: readonly SpecField[] = [
  { name: 'architecture', label: 'Architecture', type: 'select', options: COIL_ARCHITECTURES },
  { name: 'driver', label: 'Driver', type: 'select', options: COIL_DRIVERS },
  { name: 'outputs', label: 'Outputs', type: 'integer', hint: 'towers or leads' },
  { name: 'connectorPins', label: 'Connector pins', type: 'integer' },
  { name: 'connectorKey', label: 'Connector key', type: 'text' },
  { name: 'primaryOhmMin', label: 'Primary resistance min', type: 'number', unit: 'Ω', hint: 'at 20 °C' },
  { name: 'primaryOhmMax', label: 'Primary resistance max', type: 'number', unit: 'Ω', hint: 'at 20 °C' },
  { name: 'primaryInductanceMh', label: 'Primary inductance', type: 'number', unit: 'mH' },
  { name: 'secondaryKohmMin', label: 'Secondary resistance min', type: 'number', unit: 'kΩ', optional: true },
  { name: 'secondaryKohmMax', label: 'Secondary resistance max', type: 'number', unit: 'kΩ', optional: true },
  { name: 'turnsRatio', label: 'Turns ratio', type: 'number', unit: ':1', hint: 'secondary turns per primary turn' },
  { name: 'availableKv', label: 'Available voltage', type: 'number', unit: 'kV', optional: true, hint: 'as rated; optional' },
  { name: 'peakCurrentA', label: 'Peak primary current', type: 'number', unit: 'A' },
];

export const PLUG_SPEC_FIELDS: readonly SpecField[] = [
  { name: 'threadMm', label: 'Thread', type: 'number', unit: 'mm' },
  { name: 'threadPitchMm', label: 'Thread pitch', type: 'number', unit: 'mm' },
  { name: 'reachMm', label: 'Reach', type: 'number', unit: 'mm' },
  { name: 'seat', label: 'Seat', type: 'select', options: PLUG_SEATS },
  { name: 'hexMm', label: 'Hex', type: 'number', unit: 'mm' },
  { name: 'heatCode', label: 'Heat code', type: 'heat-code' },
  { name: 'gapMm', label: 'Gap', type: 'number', unit: 'mm', hint: 'as supplied' },
  { name: 'resistorKohm', label: 'Resistor value', type: 'number', unit: 'kΩ', optional: true },
  { name: 'electrode', label: 'Electrode', type: 'select', options: PLUG_ELECTRODES },
  { name: 'resistor', label: 'Resistor', type: 'checkbox' },
  { name: 'regappable', label: 'May be re-gapped', type: 'checkbox' },
  { name: 'projectedTip', label: 'Projected tip', type: 'checkbox' },
];

export const specFieldsFor = (kind: PartKind): readonly SpecField[] => (kind === 'coil' ? COIL_SPEC_FIELDS : PLUG_SPEC_FIELDS);

/** Empty values: selects on their first choice, checkboxes off, the rest blank. */
export function emptySpecValues(kind: PartKind): SpecValues {
  const values: SpecValues = {};
  for (const f of specFieldsFor(kind)) {
    if (f.type === 'select') values[f.name] = f.options[0] ?? '';
    else if (f.type === 'checkbox') values[f.name] = false;
    else values[f.name] = '';
  }
  return values;
}

/** A spec on file as form values, to edit from. */
export function specValuesOf(kind: PartKind, spec: ShownSpec): SpecValues {
  const values = emptySpecValues(kind);
  const record = spec as Record<string, unknown>;
  for (const f of specFieldsFor(kind)) {
    const v = record[f.name];
    if (typeof v === 'boolean') values[f.name] = v;
    else if (typeof v === 'number' || typeof v === 'string') values[f.name] = String(v);
  }
  return values;
}

function toInput(kind: PartKind, values: SpecValues): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const f of specFieldsFor(kind)) {
    const v = values[f.name];
    if (f.type === 'checkbox') out[f.name] = v === true;
    else if (f.type === 'select') out[f.name] = v;
    else {
      const text = typeof v === 'string' ? v.trim() : '';
      if (text === '') out[f.name] = f.type !== 'heat-code' && 'optional' in f && f.optional ? null : undefined;
      else if (f.type === 'text' || f.type === 'heat-code') out[f.name] = text;
      // Many keyboards type a decimal comma.
      else out[f.name] = Number(text.replace(',', '.'));
    }
  }
  return out;
}

const LABELS = new Map([...COIL_SPEC_FIELDS, ...PLUG_SPEC_FIELDS].map((f) => [f.name, f.label] as const));
const FIELD_BY_NAME = new Map([...COIL_SPEC_FIELDS, ...PLUG_SPEC_FIELDS].map((f) => [f.name, f] as const));

/** A schema message in the form's words: field names become their labels. */
export const specMessage = (message: string): string => inFormWords(message, (key) => LABELS.get(key));

function issueWords(issue: z.core.$ZodIssue, input: unknown): string {
  if (input === undefined) return 'required';
  if (typeof input === 'number' && Number.isNaN(input)) return 'not a number';
  if (issue.code === 'too_small' && typeof issue.minimum === 'number')
    return issue.inclusive ? `at least ${issue.minimum}` : `must be above ${issue.minimum}`;
  if (issue.code === 'too_big' && typeof issue.maximum === 'number')
    return issue.inclusive ? `at most ${issue.maximum}` : `must be below ${issue.maximum}`;
  if (issue.code === 'invalid_type' && issue.expected === 'int') return 'a whole number';
  return specMessage(issue.message);
}

/** A parsed spec as the part bodies carry it: under `coil` or under `plug`. */
export type SpecBody = { coil: CoilSpec } | { plug: PlugSpec };
export type SpecParse = { ok: true; body: SpecBody } | { ok: false; errors: Record<string, string> };

function errorsOf(error: z.ZodError, input: Record<string, unknown>): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.');
    errors[key] ??= issueWords(issue, input[key]);
  }
  if (errors.heatCode === 'required') errors.heatCode = 'choose the heat code';
  return errors;
}

/** The typed values as a coil or plug spec, or a message by each field that is wrong. */
export function parseSpec(kind: PartKind, values: SpecValues): SpecParse {
  const input = toInput(kind, values);
  if (kind === 'coil') {
    const r = coilSpecSchema.safeParse(input);
    return r.success ? { ok: true, body: { coil: r.data } } : { ok: false, errors: errorsOf(r.error, input) };
  }
  const r = plugSpecSchema.safeParse(input);
  return r.success ? { ok: true, body: { plug: r.data } } : { ok: false, errors: errorsOf(r.error, input) };
}

/** One spec figure as text with its unit: "12.7 mm", "0.5 Ω", "yes". */
export function specFigure(name: string, value: unknown): string {
  if (value === null || value === undefined || value === '') return 'none';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  const f = FIELD_BY_NAME.get(name);
  if (typeof value === 'number' && f && (f.type === 'number' || f.type === 'integer'))
    return f.unit ? formatMeasure(value, f.unit) : String(value);
  return String(value);
}

export const specLabel = (name: string): string => LABELS.get(name) ?? name;
