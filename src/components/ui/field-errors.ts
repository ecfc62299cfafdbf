import type { z } from 'zod';
import { fieldIssuesSchema } from '@shared/schemas/error';
import { ApiError } from '@/lib/api-client';

/**
 * The field messages of an API error under one prefix, keyed by the rest of the path:
 * fieldErrorsOf(err, 'substitute.spec') → { primaryOhmMin: '…' }. A message on the prefix itself
 * (the whole side) is keyed ''.
 */
export function fieldErrorsOf(error: unknown, prefix = ''): Record<string, string> {
  if (!(error instanceof ApiError)) return {};
  // The API's 400 names each bad field: `details: [{ field: 'substitute.spec.primaryOhmMin', message }]`.
  const parsed = fieldIssuesSchema.safeParse(error.details);
  if (!parsed.success) return {};
  const out: Record<string, string> = {};
  for (const { field, message } of parsed.data) {
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
 * ("primaryOhmMin must not exceed primaryOhmMax") become the fields' labels.
 */
export function inFormWords(message: string, labelOf: (key: string) => string | undefined): string {
  return message.replace(/\b[a-z]+(?:[A-Z][a-z]*)+\b/g, (key) => {
    const label = labelOf(key);
    return label ? `“${label}”` : key;
  });
}
