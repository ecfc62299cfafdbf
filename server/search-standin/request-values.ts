/** Small readers for query-string and path values, which Express hands over untyped. */
import { badRequest } from './meili-error';

export function queryString(value: unknown): string | undefined {
  if (typeof value === 'string') return value;
  if (Array.isArray(value) && typeof value[0] === 'string') return value[0];
  return undefined;
}

export function queryInteger(value: unknown, name: string, fallback: number): number {
  const text = queryString(value);
  if (text === undefined || text === '') return fallback;
  const number = Number(text);
  if (!Number.isInteger(number) || number < 0) {
    throw badRequest(
      `invalid_${name.replace(/[A-Z]/g, (letter) => `_${letter.toLowerCase()}`)}`,
      `Invalid value in parameter \`${name}\`: could not parse \`${text}\` as a positive integer.`,
    );
  }
  return number;
}

/** Comma-separated lists, as the SDK sends arrays in query strings. */
export function queryList(value: unknown): string[] | undefined {
  const text = queryString(value);
  if (text === undefined || text === '') return undefined;
  return text
    .split(',')
    .map((item) => item.trim())
    .filter((item) => item.length > 0);
}

export function queryBoolean(value: unknown): boolean | undefined {
  const text = queryString(value);
  if (text === undefined) return undefined;
  return text === 'true';
}
