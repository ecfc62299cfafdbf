import type { z } from 'zod';
import { fieldIssuesSchema, type FieldIssue } from '@shared/schemas/error';
import { formatMeasure } from '@shared/format';
import { specField } from '@shared/spec-fields';
import { readsOnFromField } from '@shared/validation/field-issues';
import { ApiError } from '@/lib/api-client';

/**
 * The field messages of an API error under one prefix, keyed by the rest of the path:
 * fieldErrorsOf(err, 'substitute.spec') → { primaryOhmMin: '…' }. A message on the prefix itself
 * (the whole side) is keyed ''.
 */
export function fieldErrorsOf(error: unknown, prefix = ''): Record<string, string> {
  // The API's 400 names each bad field: `details: [{ field: 'substitute.spec.primaryOhmMin', message }]`.
  const out: Record<string, string> = {};
  for (const { field, message } of apiFieldIssues(error) ?? []) {
    if (prefix === '' || field === prefix) out[prefix === '' ? field : ''] ??= message;
    else if (field.startsWith(`${prefix}.`)) out[field.slice(prefix.length + 1)] ??= message;
  }
  return out;
}

/** Zod issues of a client-side check, keyed by their joined path, first message per field. */
export function issuesByPath(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) out[issue.path.join('.')] ??= issue.message;
  return out;
}

/**
 * A schema message in a form's own words: the camelCase field names a shared schema writes
 * ("energyReviewRatio must not exceed energyGoRatio") become the fields' labels.
 */
export function inFormWords(message: string, labelOf: (key: string) => string | undefined): string {
  return message.replace(/\b[a-z]+(?:[A-Z][a-z]*)+\b/g, (key) => {
    const label = labelOf(key);
    return label ? `“${label}”` : key;
  });
}

/**
 * A field's message as it reads under the field, in the same words the API uses
 * (shared/validation): a `plainWords` phrase reads on from the field's label, a limit in the field's unit
 * ("Reach must be at most 40 mm"); a sentence a schema wrote keeps its words, with the field names
 * in it turned into labels ("“Energy at cranking, review from” must not exceed “Energy at cranking, go from”").
 */
export function labelledMessage(
  label: string,
  message: string,
  labelOf: (key: string) => string | undefined = specLabelOf,
  unit?: string,
): string {
  if (readsOnFromField(message)) return `${label} ${unit ? withUnit(message, unit) : message}`;
  const words = inFormWords(message, labelOf);
  return words.charAt(0).toUpperCase() + words.slice(1);
}

// "must be at least -40" → "must be at least −40 °C": a limit reads in the field's unit.
const LIMIT = /^(must be (?:at least|at most|more than|less than)) (-?\d+(?:\.\d+)?)$/;
const withUnit = (message: string, unit: string): string => {
  const m = LIMIT.exec(message);
  return m ? `${m[1]} ${formatMeasure(Number(m[2]), unit, 6)}` : message;
};

export const specLabelOf = (key: string): string | undefined => specField(key)?.label;

/** The `{ field, message }` list of an API error that names fields, or null when it names none. */
export function apiFieldIssues(error: unknown): FieldIssue[] | null {
  if (!(error instanceof ApiError)) return null;
  const parsed = fieldIssuesSchema.safeParse(error.details);
  return parsed.success && parsed.data.length > 0 ? parsed.data : null;
}
