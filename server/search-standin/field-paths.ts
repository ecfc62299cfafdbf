/**
 * Reading fields out of JSON documents the way Meilisearch does: `a.b` reaches into nested
 * objects (and through arrays of objects), and a key that itself contains a dot is honoured too,
 * because Meilisearch flattens documents before indexing them.
 */
import { foldFacetValue } from './text-tokens';

export type JsonObject = Record<string, unknown>;

export function isJsonObject(value: unknown): value is JsonObject {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** The raw values found at a path; arrays met on the way are walked, not returned whole. */
export function valuesAtPath(doc: JsonObject, path: string): unknown[] {
  const found: unknown[] = [];
  collect(doc, path, found);
  return found;
}

function collect(node: unknown, path: string, found: unknown[]): void {
  if (Array.isArray(node)) {
    for (const item of node) collect(item, path, found);
    return;
  }
  if (!isJsonObject(node)) return;
  if (Object.hasOwn(node, path)) found.push(node[path]);
  let dot = path.indexOf('.');
  while (dot > 0) {
    const head = path.slice(0, dot);
    if (Object.hasOwn(node, head)) collect(node[head], path.slice(dot + 1), found);
    dot = path.indexOf('.', dot + 1);
  }
}

/** What filters, facets and sorting need to know about one field of one document. */
export interface FieldFacts {
  exists: boolean;
  isNull: boolean;
  isEmpty: boolean;
  /** Numeric values for comparisons, ranges, sorting and facet stats, numeric strings included. */
  numbers: number[];
  /** JSON numbers only: facet counts list a numeric string once, under its string. */
  jsonNumbers: number[];
  /** Folded string leaves (booleans as "true"/"false"); `displayStrings` keeps the original text. */
  strings: string[];
  displayStrings: string[];
}

export const NUMERIC_STRING = /^\s*[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?\s*$/;

export function fieldFacts(doc: JsonObject, path: string): FieldFacts {
  const values = valuesAtPath(doc, path);
  const facts: FieldFacts = {
    exists: values.length > 0,
    isNull: false,
    isEmpty: false,
    numbers: [],
    jsonNumbers: [],
    strings: [],
    displayStrings: [],
  };
  for (const value of values) {
    if (value === null) facts.isNull = true;
    else if (value === '' || (Array.isArray(value) && value.length === 0)) facts.isEmpty = true;
    else if (isJsonObject(value) && Object.keys(value).length === 0) facts.isEmpty = true;
    addLeaves(value, facts);
  }
  return facts;
}

function addLeaves(value: unknown, facts: FieldFacts): void {
  if (Array.isArray(value)) {
    for (const item of value) addLeaves(item, facts);
  } else if (typeof value === 'number') {
    if (Number.isFinite(value)) {
      facts.numbers.push(value);
      facts.jsonNumbers.push(value);
    }
  } else if (typeof value === 'string') {
    facts.strings.push(foldFacetValue(value));
    facts.displayStrings.push(value);
    // Meilisearch also files a numeric-looking string under the number facets.
    if (NUMERIC_STRING.test(value)) facts.numbers.push(Number(value));
  } else if (typeof value === 'boolean') {
    facts.strings.push(String(value));
    facts.displayStrings.push(String(value));
  }
}

/**
 * Attribute patterns as used by filterableAttributes (`*` wildcards allowed). A field also
 * matches when it lies inside a listed object field (`dims` covers `dims.reachMm`).
 */
export function matchesAttributePattern(field: string, pattern: string): boolean {
  if (pattern === '*' || pattern === field) return true;
  if (field.startsWith(`${pattern}.`)) return true;
  if (!pattern.includes('*')) return false;
  const regex = new RegExp(
    `^${pattern
      .split('*')
      .map((part) => part.replace(/[.+?^${}()|[\]\\]/g, '\\$&'))
      .join('.*')}(\\..*)?$`,
  );
  return regex.test(field);
}

/** Copies the chosen attributes of a document (top-level or dotted), keeping their nesting. */
export function pickAttributes(doc: JsonObject, attributes: readonly string[] | null): JsonObject {
  if (attributes === null) return { ...doc };
  const picked: JsonObject = {};
  for (const [key, value] of Object.entries(doc)) {
    if (attributes.includes(key) || attributes.some((attr) => key.startsWith(`${attr}.`))) {
      picked[key] = value;
      continue;
    }
    const nestedWanted = attributes.filter((attr) => attr.startsWith(`${key}.`)).map((attr) => attr.slice(key.length + 1));
    if (nestedWanted.length === 0) continue;
    if (isJsonObject(value)) {
      const inner = pickAttributes(value, nestedWanted);
      if (Object.keys(inner).length > 0) picked[key] = inner;
    } else if (Array.isArray(value)) {
      picked[key] = value
        .filter(isJsonObject)
        .map((item) => pickAttributes(item, nestedWanted))
        .filter((item) => Object.keys(item).length > 0);
    }
  }
  return picked;
}
