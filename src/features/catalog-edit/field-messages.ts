import { conflictDetailsSchema } from '@shared/schemas/error';
import { fieldErrorsOf } from '@/components/ui/field-errors';
import { ApiError } from '@/lib/api-client';

// A unique violation names its constraint (server/migrations/1764600100000-Catalog.ts).
const CONFLICTS: Record<string, { field: string; message: string }> = {
  brand_name_norm_key: { field: 'name', message: 'a brand by this name is already on file' },
  part_brand_number_uq: { field: 'partNumber', message: 'this brand already has a part with this number' },
  interchange_uq: { field: 'number', message: 'this number is already on file for this part' },
};

/**
 * An API error's messages keyed by field, under an optional prefix ('plug' → 'reachMm'). Besides
 * the 400's details, some refusals name their field only in the message ("supersededById: that
 * would make a supersession loop") and a 409 names its unique constraint: both are placed too.
 */
export function fieldMessages(error: unknown, prefix = ''): Record<string, string> {
  if (!(error instanceof ApiError)) return {};
  const out = fieldErrorsOf(error, prefix);
  if (Object.keys(out).length) return out;
  if (error.status === 409) {
    const parsed = conflictDetailsSchema.safeParse(error.details);
    const known = parsed.success ? CONFLICTS[parsed.data.constraint] : undefined;
    if (known) return prefix === '' ? { [known.field]: known.message } : {};
  }
  const named = /^([A-Za-z][\w.]*): (.+)$/.exec(error.message);
  if (error.status === 400 && named) {
    const [, field = '', message = ''] = named;
    if (prefix === '') return { [field]: message };
    if (field === prefix) return { '': message };
    if (field.startsWith(`${prefix}.`)) return { [field.slice(prefix.length + 1)]: message };
  }
  return {};
}

/**
 * The error's message when none of the form's own fields can carry it (a network failure, a 403,
 * a refusal naming a field the form does not show), so no refusal goes unsaid.
 */
export function unplacedError(error: unknown, shown: Record<string, string>, fields: readonly string[]): Error | null {
  if (!error) return null;
  if (fields.some((f) => shown[f] !== undefined)) return null;
  return error instanceof Error ? error : new Error(String(error));
}

/**
 * An API error as the kit's Form places it: a 409 on a known unique constraint, or a 400 that
 * names its field only in its message, becomes the `{ field, message }` details Form puts beside
 * that field. Anything else is passed on as it came.
 */
export function placedError(error: unknown): unknown {
  if (!(error instanceof ApiError) || Object.keys(fieldErrorsOf(error)).length) return error;
  // The same error gives the same object: Form places an error again whenever it changes.
  let placed = PLACED.get(error);
  if (!placed) {
    const details = Object.entries(fieldMessages(error)).map(([field, message]) => ({ field, message }));
    placed = details.length ? new ApiError(error.status, error.code, error.message, details) : error;
    PLACED.set(error, placed);
  }
  return placed;
}
const PLACED = new WeakMap<ApiError, ApiError>();
