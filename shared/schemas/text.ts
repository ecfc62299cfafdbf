import { z } from 'zod';

/**
 * The one schema for text a person or another system types in: every free-text field of a body
 * and every text query parameter. Trimmed, and refused with a 400 naming the field when it holds
 * a control character — NUL above all, which PostgreSQL cannot store in text. A multi-line note
 * keeps its tabs and line breaks.
 */

/** C0 controls, DEL and C1 controls: nothing a person means to type. */
// eslint-disable-next-line no-control-regex
export const SINGLE_LINE_PATTERN = /^[^\u0000-\u001f\u007f-\u009f]*$/;
/** The same, less tab, line feed and carriage return. */
// eslint-disable-next-line no-control-regex
export const MULTI_LINE_PATTERN = /^[^\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]*$/;

export const CONTROL_CHARACTER_MESSAGE = 'must not contain control characters';
export const MULTI_LINE_CONTROL_MESSAGE = 'must not contain control characters other than tabs and line breaks';

export interface TextOptions {
  /** At most this many characters, after trimming. */
  max: number;
  /** At least this many characters, after trimming (1: not blank). */
  min?: number;
  /** Tabs and line breaks allowed: a note, not a name. */
  multiline?: boolean;
  /** Off for what must arrive exactly as sent: a password, a file's header. */
  trim?: boolean;
}

export function text({ max, min = 0, multiline = false, trim = true }: TextOptions) {
  const base = trim ? z.string().trim() : z.string();
  const clean = multiline
    ? base.regex(MULTI_LINE_PATTERN, MULTI_LINE_CONTROL_MESSAGE)
    : base.regex(SINGLE_LINE_PATTERN, CONTROL_CHARACTER_MESSAGE);
  return (min > 0 ? clean.min(min) : clean).max(max);
}

// eslint-disable-next-line no-control-regex
export const NO_NUL_PATTERN = /^[^\u0000]*$/;

/**
 * Text read from a supplier's file and sent back as it was (a column header in a mapping): a
 * damaged file can put any character there, so only NUL, which PostgreSQL cannot store, is refused.
 */
export const fileText = (max: number) => z.string().max(max).regex(NO_NUL_PATTERN, 'must not contain a NUL character');

/** A link token (invitation, shared fit report): base64url, as the server makes them. */
export const linkTokenSchema = z
  .string()
  .min(20)
  .max(200)
  .regex(/^[A-Za-z0-9_-]+$/, 'must be a link token (letters, digits, - and _)');
