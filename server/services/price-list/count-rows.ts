import type { Readable } from 'node:stream';
import { PRICE_LIST_LIMITS } from '../../../shared/price-list/fields';
import type { Delimiter } from './delimiter';
import { openText, tooManyRows } from './parse';

const QUOTE = 0x22;
const LF = 0x0a;
const CR = 0x0d;

const enum State {
  /** Nothing of the field read yet: a quote here opens a quoted field. */
  FieldStart,
  /** Inside a field that did not start with a quote: quotes are plain text. */
  Unquoted,
  Quoted,
  /** A quote inside a quoted field: the next byte says whether it closes the field. */
  QuoteInQuoted,
}

/** Bytes a trim() removes that are ASCII; anything above 0x7f is never taken for content (see below). */
const isAsciiSpace = (b: number): boolean => b === 0x20 || (b >= 0x09 && b <= 0x0d);

/**
 * Counts the records of decoded CSV text the way csv-parse reads them with the options of
 * parse.ts (quote `"` doubled to escape, opening only at a field's start; relax_quotes; CR, LF
 * and CRLF end a record), at the speed of a byte scan, so that a file over the row limit is
 * refused while it is still arriving rather than after every row was checked and staged.
 *
 * It counts only records with content, as the parser counts data lines: a record of spaces,
 * delimiters and empty quotes is blank. A byte above 0x7f is not taken for content (it may be
 * part of a non-breaking space, which trim() removes), so the count can fall short of the
 * parser's, never exceed it: the early refusal never refuses a file the parser would accept.
 */
export class RecordCounter {
  private state = State.FieldStart;
  /** A CR ended the last record: an LF right after it belongs to the same line end. */
  private afterCr = false;
  private content = false;
  /** Records with content, the header included. */
  records = 0;
  private readonly delimiter: number;

  constructor(delimiter: Delimiter) {
    this.delimiter = delimiter.charCodeAt(0);
  }

  write(chunk: Buffer): void {
    const delimiter = this.delimiter;
    let state = this.state;
    let content = this.content;
    let afterCr = this.afterCr;
    for (let i = 0; i < chunk.length; i++) {
      const b = chunk[i]!;
      if (afterCr) {
        afterCr = false;
        if (b === LF) continue;
      }
      if (state === State.QuoteInQuoted) {
        if (b === QUOTE) {
          // A doubled quote: one quote of text.
          content = true;
          state = State.Quoted;
          continue;
        }
        if (b === delimiter || b === CR || b === LF) {
          state = State.Unquoted;
        } else {
          // relax_quotes: a quote followed by text ends the quoting; the quote stays in the field.
          content = true;
          state = State.Unquoted;
        }
      }
      if (state === State.Quoted) {
        if (b === QUOTE) state = State.QuoteInQuoted;
        else if (b < 0x80 && !isAsciiSpace(b)) content = true;
        continue;
      }
      if (b === delimiter) {
        state = State.FieldStart;
      } else if (b === CR || b === LF) {
        if (content) this.records++;
        content = false;
        state = State.FieldStart;
        afterCr = b === CR;
      } else if (b === QUOTE && state === State.FieldStart) {
        state = State.Quoted;
      } else {
        if (b < 0x80 && !isAsciiSpace(b)) content = true;
        state = State.Unquoted;
      }
    }
    this.state = state;
    this.content = content;
    this.afterCr = afterCr;
  }

  /** The end of the text: a last record without a line end counts too. */
  end(): void {
    if (this.content) this.records++;
    this.content = false;
  }

  /** Records after the header, as parse.ts numbers data lines. */
  get dataLines(): number {
    return Math.max(0, this.records - 1);
  }
}

export interface CountOptions {
  maxDataRows?: number;
  maxFileBytes?: number;
}

/**
 * Reads an upload through the same decoding and delimiter choice as the parser and throws the
 * parser's too-many-rows refusal as soon as the count passes the limit. Other problems of the
 * file are the parser's to report: this rejects with whatever stopped the reading.
 */
export async function countDataLines(input: Readable, opts: CountOptions = {}): Promise<number> {
  const maxDataRows = opts.maxDataRows ?? PRICE_LIST_LIMITS.maxDataRows;
  const { decoder, delimiter, text } = await openText(input, opts.maxFileBytes ?? PRICE_LIST_LIMITS.maxFileBytes);
  const counter = new RecordCounter(delimiter);
  try {
    for await (const chunk of text) {
      counter.write(chunk as Buffer);
      if (counter.dataLines > maxDataRows) throw tooManyRows(maxDataRows);
    }
    counter.end();
    if (counter.dataLines > maxDataRows) throw tooManyRows(maxDataRows);
    return counter.dataLines;
  } finally {
    text.destroy();
    decoder.destroy();
  }
}
