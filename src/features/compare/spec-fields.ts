import type { z } from 'zod';
import { coilSpecSchema, resolvedPlugSpecSchema, type CoilSpec, type PartKind, type ResolvedPlugSpec } from '@shared/schemas/specs';
import { specField, specFieldsOf, type SpecFieldDef } from '@shared/spec-fields';
import { inFormWords, issuesByPath } from '@/components/ui/field-errors';

/**
 * The typed-in spec forms: one field per spec field of shared/schemas/specs.ts, with its unit.
 * The form holds text (what the person typed); `parseSpec` turns it into a spec through the same
 * zod schema the API validates with, so the client and the server agree on what is valid.
 */

export type FormValues = Record<string, string | boolean>;

export const fieldsFor = (kind: PartKind): readonly SpecFieldDef[] => specFieldsOf(kind);

/** Empty form values for a kind: selects on their first option, checkboxes off. */
export function emptyValues(kind: PartKind): FormValues {
  const values: FormValues = {};
  for (const f of fieldsFor(kind)) {
    if (f.input === 'select') values[f.name] = f.options?.[0] ?? '';
    else if (f.input === 'checkbox') values[f.name] = false;
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
    if (f.input === 'checkbox') out[f.name] = v === true;
    else if (f.input === 'select') out[f.name] = v;
    else {
      const text = typeof v === 'string' ? v.trim() : '';
      if (text === '') out[f.name] = f.optional ? null : undefined;
      // A comma is a decimal point on many keyboards' layouts.
      else out[f.name] = f.input === 'text' ? text : Number(text.replace(',', '.'));
    }
  }
  return out;
}

export type SpecParse<S> = { ok: true; spec: S } | { ok: false; errors: Record<string, string> };

/** A schema message with the form's labels for the field names it writes. */
export const specMessage = (message: string): string => inFormWords(message, (key) => specField(key)?.label);

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
