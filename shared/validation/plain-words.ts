import type { z } from 'zod';

/**
 * Zod's issues in plain words, as the predicate of a sentence whose subject is the field:
 * "must be at least 5", "must be one of copper, platinum, iridium". Passed as the `error` option
 * of a parse, it fills in only what a schema leaves unsaid: a message written in a schema wins.
 * Every phrase starts with "must" or "is", so `fieldSentence` can read it on from the field's name.
 */
export const plainWords: z.core.$ZodErrorMap = (issue) => {
  switch (issue.code) {
    case 'invalid_type':
      if (issue.input === undefined || issue.expected === 'nonoptional') return 'is required';
      return `must be ${KIND_WORDS[issue.expected] ?? issue.expected}`;
    case 'too_small':
      return tooSmall(issue.origin, issue.minimum, issue.inclusive ?? true, issue.exact ?? false);
    case 'too_big':
      return tooBig(issue.origin, issue.maximum, issue.inclusive ?? true, issue.exact ?? false);
    case 'invalid_format':
      return `must be ${FORMAT_WORDS[issue.format] ?? `in the ${issue.format} format`}`;
    case 'not_multiple_of':
      return `must be a multiple of ${String(issue.divisor)}`;
    case 'unrecognized_keys':
      return `must not have ${issue.keys.length === 1 ? 'the field' : 'the fields'} ${issue.keys.join(', ')}`;
    case 'invalid_value':
      return issue.values.length === 1 ? `must be ${String(issue.values[0])}` : `must be one of ${issue.values.map(String).join(', ')}`;
    case 'invalid_union': {
      // A discriminated union whose discriminator matched no branch lists the values it takes.
      const options = (issue as { options?: unknown }).options;
      return Array.isArray(options) ? `must be one of ${options.map(String).join(', ')}` : 'does not match any accepted form';
    }
    case 'invalid_key':
      return 'is not a valid key';
    case 'invalid_element':
      return 'holds an invalid value';
    default:
      return 'is not valid';
  }
};

const KIND_WORDS: Record<string, string> = {
  string: 'text',
  number: 'a number',
  int: 'a whole number',
  bigint: 'a whole number',
  boolean: 'true or false',
  array: 'a list',
  object: 'an object',
  record: 'an object',
  date: 'a date',
  null: 'null',
};

const FORMAT_WORDS: Record<string, string> = {
  email: 'an e-mail address',
  uuid: 'an id (a UUID)',
  guid: 'an id (a GUID)',
  url: 'a web address',
  datetime: 'a date and time (ISO 8601)',
  date: 'a date (YYYY-MM-DD)',
  regex: 'in the expected format',
};

const count = (n: number | bigint, one: string, many: string) => `${String(n)} ${Number(n) === 1 ? one : many}`;

function tooSmall(origin: string, minimum: number | bigint, inclusive: boolean, exact: boolean): string {
  if (origin === 'string') {
    if (Number(minimum) === 1 && !exact) return 'must not be blank';
    return `must be ${exact ? 'exactly' : 'at least'} ${count(minimum, 'character', 'characters')} long`;
  }
  if (origin === 'array' || origin === 'set') return `must have ${exact ? 'exactly' : 'at least'} ${count(minimum, 'item', 'items')}`;
  if (exact) return `must be ${String(minimum)}`;
  return inclusive ? `must be at least ${String(minimum)}` : `must be more than ${String(minimum)}`;
}

function tooBig(origin: string, maximum: number | bigint, inclusive: boolean, exact: boolean): string {
  if (origin === 'string') return `must be ${exact ? 'exactly' : 'at most'} ${count(maximum, 'character', 'characters')} long`;
  if (origin === 'array' || origin === 'set') return `must have ${exact ? 'exactly' : 'at most'} ${count(maximum, 'item', 'items')}`;
  if (exact) return `must be ${String(maximum)}`;
  return inclusive ? `must be at most ${String(maximum)}` : `must be less than ${String(maximum)}`;
}
