/**
 * The part of Meilisearch's filter syntax the app sends: conditions `attr = value`, `attr != value`,
 * `attr < | <= | > | >= number` and `attr a TO b`, joined by AND within a string; an array of such
 * strings is ANDed, and an inner array ORed, as Meilisearch reads the array form.
 */
import { badRequest, type MeiliError } from './meili-error';

export type Doc = Record<string, unknown>;
export type Predicate = (doc: Doc) => boolean;

const VALUE = String.raw`"(?:[^"\\]|\\.)*"|'(?:[^'\\]|\\.)*'|[^\s'"()\[\],]+`;
const CONDITION = new RegExp(
  String.raw`^\s*([A-Za-z0-9_.-]+)\s*(?:(!=|>=|<=|=|<|>)\s*(${VALUE})|\s(${VALUE})\s+TO\s+(${VALUE}))\s*(?:AND\s+(?=\S)|$)`,
);

const invalid = (message: string): MeiliError => badRequest('invalid_search_filter', message);

function unquote(raw: string): string {
  const q = raw[0];
  return q === '"' || q === "'" ? raw.slice(1, -1).replace(/\\(.)/g, '$1') : raw;
}

function toNumber(raw: string): number {
  const n = Number(unquote(raw));
  if (raw.trim() === '' || Number.isNaN(n)) throw invalid(`\`${raw}\` is not a number: a comparison or a range needs one.`);
  return n;
}

/** Whether the attribute, or any element of an array attribute, passes the test. */
function some(d: Doc, attr: string, test: (v: unknown) => boolean): boolean {
  const v = d[attr];
  return Array.isArray(v) ? v.some(test) : v !== undefined && v !== null && test(v);
}

function condition(attr: string, op: string | undefined, a: string, b: string | undefined): Predicate {
  if (op === '=' || op === '!=') {
    const text = unquote(a);
    const num = text.trim() === '' ? NaN : Number(text);
    const equal = (v: unknown) => (typeof v === 'number' ? v === num : String(v) === text);
    return op === '=' ? (d) => some(d, attr, equal) : (d) => !some(d, attr, equal);
  }
  const lo = toNumber(a);
  const hi = b === undefined ? lo : toNumber(b);
  const tests: Record<string, (n: number) => boolean> = {
    '<': (n) => n < lo,
    '<=': (n) => n <= lo,
    '>': (n) => n > lo,
    '>=': (n) => n >= lo,
  };
  const test = op ? tests[op]! : (n: number) => n >= lo && n <= hi;
  const numeric = (v: unknown) => typeof v === 'number' && test(v);
  return (d) => some(d, attr, numeric);
}

function parseString(text: string, filterable: ReadonlySet<string>): Predicate {
  const parts: Predicate[] = [];
  let rest = text.trim();
  if (rest === '') return () => true;
  while (rest !== '') {
    const m = CONDITION.exec(rest);
    if (!m) throw invalid(`Was expecting \`attribute OPERATOR value\` or \`attribute a TO b\`, joined by AND, at \`${rest}\`.`);
    const [whole, attr = '', op, value, from, to] = m;
    const available = [...filterable].sort().join(', ');
    if (!filterable.has(attr))
      throw invalid(`Attribute \`${attr}\` is not filterable. Available filterable attributes are: \`${available}\`.`);
    parts.push(condition(attr, op, (value ?? from)!, op ? undefined : to));
    rest = rest.slice(whole.length);
  }
  return all(parts);
}

/** Every predicate holds; a loop, as this runs once per document. */
function all(parts: Predicate[]): Predicate {
  return (d) => {
    for (const p of parts) if (!p(d)) return false;
    return true;
  };
}

/** The filter as a predicate over documents, or null when there is none; malformed filters throw `invalid_search_filter`. */
export function compileFilter(filter: unknown, filterable: ReadonlySet<string>): Predicate | null {
  if (filter === undefined || filter === null) return null;
  if (typeof filter === 'string') return parseString(filter, filterable);
  if (!Array.isArray(filter)) throw invalid('A filter is a string or an array of strings and arrays of strings.');
  const items = filter.map((item: unknown): Predicate => {
    if (typeof item === 'string') return parseString(item, filterable);
    if (Array.isArray(item) && item.every((s) => typeof s === 'string')) {
      const any = (item as string[]).map((s) => parseString(s, filterable));
      return (d) => any.some((p) => p(d));
    }
    throw invalid('A filter array holds strings and arrays of strings, one level deep.');
  });
  return all(items);
}
