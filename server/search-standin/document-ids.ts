/** Primary keys and document ids, with Meilisearch's inference rule and error codes. */
import { MeiliError } from './meili-error';
import { valuesAtPath, type JsonObject } from './field-paths';

const VALID_STRING_ID = /^[a-zA-Z0-9_-]{1,511}$/;

/** Meilisearch picks the one top-level field whose name ends in `id`, case-insensitively. */
export function inferPrimaryKey(indexUid: string, firstDocument: JsonObject): string {
  const candidates = Object.keys(firstDocument).filter((key) => key.toLowerCase().endsWith('id'));
  if (candidates.length === 1) return candidates[0] as string;
  if (candidates.length === 0) {
    throw new MeiliError(
      400,
      'index_primary_key_no_candidate_found',
      `Index \`${indexUid}\`: The primary key inference failed as the engine did not find any field ending with \`id\` in its name. Please specify the primary key manually using the \`primaryKey\` query parameter.`,
    );
  }
  throw new MeiliError(
    400,
    'index_primary_key_multiple_candidates_found',
    `Index \`${indexUid}\`: The primary key inference failed as the engine found ${candidates.length} fields ending with \`id\` in their names: ${candidates.map((key) => `'${key}'`).join(' and ')}. Please specify the primary key manually using the \`primaryKey\` query parameter.`,
  );
}

/** The document's id as the string Meilisearch keys it by (`1` and `"1"` are the same document). */
export function documentIdOf(indexUid: string, primaryKey: string, doc: JsonObject): string {
  const values = valuesAtPath(doc, primaryKey);
  if (values.length === 0) {
    throw new MeiliError(
      400,
      'missing_document_id',
      `Index \`${indexUid}\`: Document doesn't have a \`${primaryKey}\` attribute: \`${JSON.stringify(doc)}\`.`,
    );
  }
  const value = values[0];
  if (typeof value === 'number' && Number.isSafeInteger(value) && value >= 0) return String(value);
  if (typeof value === 'string' && VALID_STRING_ID.test(value)) return value;
  throw new MeiliError(
    400,
    'invalid_document_id',
    `Index \`${indexUid}\`: Document identifier \`${JSON.stringify(value)}\` is invalid. A document identifier can be of type integer or string, only composed of alphanumeric characters (a-z A-Z 0-9), hyphens (-) and underscores (_), and can not be more than 511 bytes.`,
  );
}

/** Ids given to delete-batch or in a URL: numbers or strings, compared as strings. */
export function normalizeRequestedId(value: unknown): string | null {
  if (typeof value === 'number' && Number.isFinite(value)) return String(value);
  if (typeof value === 'string') return value;
  return null;
}
