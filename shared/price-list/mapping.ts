import { z } from 'zod';
import { fileText, NO_NUL_PATTERN } from '../schemas/text';
import { FIELD_LABELS, HEADER_SYNONYMS, PRICE_LIST_FIELDS, PRICE_LIST_LIMITS, REQUIRED_FIELDS, type PriceListField } from './fields';

/**
 * A mapping from a file's columns to Arcwise fields. A key is a header as printed in the file
 * or, for a column with an empty header, its 0-based index as digits ("7"); a header that is
 * itself digits wins over the index reading. `null` leaves a column unused.
 */
export const mappingSchema = z
  .record(fileText(PRICE_LIST_LIMITS.maxHeaderChars), z.enum(PRICE_LIST_FIELDS).nullable())
  .refine((m) => Object.keys(m).length <= PRICE_LIST_LIMITS.maxColumns, {
    message: `at most ${PRICE_LIST_LIMITS.maxColumns} columns`,
  })
  // The document generator leaves a record's key schema out: say it here.
  .meta({ propertyNames: { type: 'string', maxLength: PRICE_LIST_LIMITS.maxHeaderChars, pattern: NO_NUL_PATTERN.source } });
export type Mapping = z.infer<typeof mappingSchema>;

/** A mapping pinned to one file's columns: each mapped field's column index. */
export interface ResolvedMapping {
  headers: readonly string[];
  columns: Partial<Record<PriceListField, number>>;
}

export type MappingProblem =
  | { code: 'missing-required'; field: PriceListField; message: string }
  | { code: 'mapped-twice'; field: PriceListField; columns: string[]; message: string }
  | { code: 'unknown-column'; key: string; message: string };

export type MappingCheck = { ok: true; resolved: ResolvedMapping } | { ok: false; problems: MappingProblem[] };

const NUMBER_WORDS = new Set(['no', 'number', 'num', 'nr', 'nbr', 'nummer']);
// Units and currencies suppliers append to a header; dropped only in the second, looser pass.
const NOISE_WORDS = new Set(['usd', 'eur', 'gbp', 'cad', 'us', 'ea', 'each', 'per', 'unit', 'mm', 'ohm', 'kohm', 'mh', 'kv', 'v', 'a']);

function headerTokens(header: string, loose: boolean): string[] {
  let s = header
    .normalize('NFKD')
    .replace(/\p{M}/gu, '')
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .toLowerCase()
    .replace(/[Ωω]/g, ' ohm ')
    .replace(/#|n[º°]/g, ' no ');
  if (loose) s = s.replace(/\([^)]*\)|\[[^\]]*\]/g, ' ');
  const tokens = s
    .split(/[^a-z0-9]+/)
    .filter((t) => t !== '')
    .map((t) => (NUMBER_WORDS.has(t) ? 'no' : t === 'quantity' ? 'qty' : t));
  return loose ? tokens.filter((t) => !NOISE_WORDS.has(t)) : tokens;
}

/**
 * Folds a header for comparison: "Part #", "PART NO.", "part_no" and "partNumber" all become
 * "partno". Case, accents, punctuation and spacing differ between suppliers, not meaning.
 */
export function normalizeHeader(header: string): string {
  return headerTokens(header, false).join('');
}

function buildIndex(loose: boolean): Map<string, PriceListField> {
  const index = new Map<string, PriceListField>();
  for (const field of PRICE_LIST_FIELDS) {
    for (const name of [field, FIELD_LABELS[field], ...HEADER_SYNONYMS[field]]) {
      const key = headerTokens(name, loose).join('');
      // First field listed keeps a shared synonym, so the order of PRICE_LIST_FIELDS decides.
      if (key !== '' && !index.has(key)) index.set(key, field);
    }
  }
  return index;
}
const STRICT_INDEX = buildIndex(false);
const LOOSE_INDEX = buildIndex(true);

/** The field a header most likely means, or null. */
export function guessField(header: string): PriceListField | null {
  return STRICT_INDEX.get(normalizeHeader(header)) ?? LOOSE_INDEX.get(headerTokens(header, true).join('')) ?? null;
}

/** Guesses each column's field from its header; a field goes to the first column that claims it. */
export function guessMapping(headers: readonly string[]): Mapping {
  const mapping: Mapping = {};
  const taken = new Set<PriceListField>();
  headers.forEach((header, i) => {
    const key = header.trim() === '' ? String(i) : header;
    const field = guessField(header);
    if (field !== null && !taken.has(field)) {
      taken.add(field);
      mapping[key] = field;
    } else {
      mapping[key] = null;
    }
  });
  return mapping;
}

/** The column a mapping key names: exact header, then folded header, then a digits index. */
export function findColumn(headers: readonly string[], key: string): number | null {
  const exact = headers.indexOf(key);
  if (exact !== -1) return exact;
  const folded = normalizeHeader(key);
  if (folded !== '') {
    const matches = headers.flatMap((h, i) => (normalizeHeader(h) === folded ? [i] : []));
    if (matches.length === 1) return matches[0] ?? null;
  }
  if (/^\d+$/.test(key)) {
    const index = Number(key);
    if (index < headers.length) return index;
  }
  return null;
}

/**
 * A mapping remembered for a supplier, carried onto a new file: remembered columns that still
 * exist keep their field, the rest is guessed (a field already taken is not guessed again).
 */
export function applyRememberedMapping(headers: readonly string[], remembered: Mapping): Mapping {
  const guessed = guessMapping(headers);
  const result: Mapping = {};
  const taken = new Set<PriceListField>();
  const fromMemory = new Map<number, PriceListField | null>();
  for (const [key, field] of Object.entries(remembered)) {
    const column = findColumn(headers, key);
    if (column === null) continue;
    fromMemory.set(column, field);
    if (field !== null) taken.add(field);
  }
  headers.forEach((header, i) => {
    const key = header.trim() === '' ? String(i) : header;
    const kept = fromMemory.get(i);
    if (kept !== undefined) {
      result[key] = kept;
      return;
    }
    const guess = guessed[key] ?? null;
    result[key] = guess !== null && !taken.has(guess) ? guess : null;
    if (guess !== null) taken.add(guess);
  });
  return result;
}

/**
 * Checks a mapping against a file's headers: every key names a column, no field is mapped to
 * two columns, and every required field is mapped. On success, the mapping pinned to indexes.
 */
export function validateMapping(headers: readonly string[], mapping: Mapping): MappingCheck {
  const problems: MappingProblem[] = [];
  const byField = new Map<PriceListField, number[]>();
  for (const [key, field] of Object.entries(mapping)) {
    const column = findColumn(headers, key);
    if (column === null) {
      problems.push({ code: 'unknown-column', key, message: `the file has no column "${key}"` });
      continue;
    }
    if (field === null) continue;
    const columns = byField.get(field) ?? [];
    if (!columns.includes(column)) columns.push(column);
    byField.set(field, columns);
  }
  const columns: Partial<Record<PriceListField, number>> = {};
  for (const [field, indexes] of byField) {
    if (indexes.length > 1) {
      const names = indexes.map((i) => headers[i] || `column ${i + 1}`);
      problems.push({
        code: 'mapped-twice',
        field,
        columns: names,
        message: `${FIELD_LABELS[field]} is mapped to more than one column: ${names.join(', ')}`,
      });
    }
    columns[field] = indexes[0];
  }
  for (const field of REQUIRED_FIELDS) {
    if (columns[field] === undefined) {
      problems.push({
        code: 'missing-required',
        field,
        message: `no column is mapped to ${FIELD_LABELS[field]}, which is required`,
      });
    }
  }
  return problems.length > 0 ? { ok: false, problems } : { ok: true, resolved: { headers, columns } };
}
