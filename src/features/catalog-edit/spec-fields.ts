import type { z } from 'zod';
import { coilSpecSchema, plugSpecSchema, type CoilSpec, type PartKind, type PlugSpec, type ResolvedPlugSpec } from '@shared/schemas/specs';
import { readsOnFromField } from '@shared/validation/field-issues';
import { inFormWords, labelledMessage } from '@/components/ui/field-errors';
import { COIL_SPEC_FIELDS, PLUG_SPEC_FIELDS, specField, specLabel, type SpecFieldDef } from '@shared/spec-fields';

/**
 * The spec of a catalog part as the buyer types it: one field per stored spec field of
 * shared/schemas/specs.ts, each with its unit. A plug's heat is its brand's own heat code, chosen
 * from the brand's heat table (the server maps it onto the heat step). The form holds text;
 * `parseSpec` turns it into a spec through the schema the API validates with.
 */

export type SpecValues = Record<string, string | boolean>;
export type ShownSpec = CoilSpec | ResolvedPlugSpec;

/** A stored plug spec names its brand's heat code; the heat step follows from the brand's table. */
export const specFieldsFor = (kind: PartKind): readonly SpecFieldDef[] =>
  kind === 'coil' ? COIL_SPEC_FIELDS : PLUG_SPEC_FIELDS.filter((f) => f.name !== 'heatStep');

const isHeatCode = (f: SpecFieldDef): boolean => f.name === 'heatCode';

/** Empty values: selects on their first choice, checkboxes off, the rest blank. */
export function emptySpecValues(kind: PartKind): SpecValues {
  const values: SpecValues = {};
  for (const f of specFieldsFor(kind)) {
    if (f.input === 'select') values[f.name] = f.options?.[0] ?? '';
    else if (f.input === 'checkbox') values[f.name] = false;
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
    if (f.input === 'checkbox') out[f.name] = v === true;
    else if (f.input === 'select') out[f.name] = v;
    else {
      const text = typeof v === 'string' ? v.trim() : '';
      if (text === '') out[f.name] = !isHeatCode(f) && f.optional ? null : undefined;
      else if (f.input === 'text') out[f.name] = text;
      // Many keyboards type a decimal comma.
      else out[f.name] = Number(text.replace(',', '.'));
    }
  }
  return out;
}

/**
 * A schema message in the form's words: field names become their labels, and a phrase that reads
 * on from its field ("must not be above the window's max") is led by the field's label.
 */
export const specMessage = (message: string, field?: string): string =>
  field !== undefined && readsOnFromField(message)
    ? labelledMessage(specLabel(field), message)
    : inFormWords(message, (key) => specField(key)?.label);

function issueWords(issue: z.core.$ZodIssue, input: unknown, field: string): string {
  if (input === undefined) return 'required';
  if (typeof input === 'number' && Number.isNaN(input)) return 'not a number';
  if (issue.code === 'too_small' && typeof issue.minimum === 'number')
    return issue.inclusive ? `at least ${issue.minimum}` : `must be above ${issue.minimum}`;
  if (issue.code === 'too_big' && typeof issue.maximum === 'number')
    return issue.inclusive ? `at most ${issue.maximum}` : `must be below ${issue.maximum}`;
  if (issue.code === 'invalid_type' && issue.expected === 'int') return 'a whole number';
  return specMessage(issue.message, field);
}

/** A parsed spec as the part bodies carry it: under `coil` or under `plug`. */
export type SpecBody = { coil: CoilSpec } | { plug: PlugSpec };
export type SpecParse = { ok: true; body: SpecBody } | { ok: false; errors: Record<string, string> };

function errorsOf(error: z.ZodError, input: Record<string, unknown>): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.');
    errors[key] ??= issueWords(issue, input[key], key);
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

export { formatSpecValue as specFigure } from '@shared/spec-fields';
export { specLabel };
