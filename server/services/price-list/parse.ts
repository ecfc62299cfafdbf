import { Readable, pipeline } from 'node:stream';
import { CsvError, parse, type Options } from 'csv-parse';
import { PRICE_LIST_LIMITS } from '../../../shared/price-list/fields';
import {
  applyRememberedMapping,
  guessMapping,
  validateMapping,
  type Mapping,
  type MappingProblem,
  type ResolvedMapping,
} from '../../../shared/price-list/mapping';
import { RowValidator, type NormalisedRow, type RowError } from '../../../shared/price-list/row';
import { createDecodeStream, PriceListFileError, type PriceListDecoder, type TextEncodingName } from './decode';
import { detectDelimiter, type Delimiter } from './delimiter';

export { PriceListFileError } from './decode';

export interface ParseOptions {
  /** The buyer's mapping; without one, the mapping is guessed from the headers. */
  mapping?: Mapping;
  /** The buyer's choice of delimiter; without one, it is guessed from the first lines. */
  delimiter?: Delimiter;
  /** The supplier's mapping from an earlier file, carried onto these headers when no mapping is given. */
  rememberedMapping?: Mapping;
  maxFieldChars?: number;
  maxFileBytes?: number;
  maxRecordChars?: number;
  maxDataRows?: number;
  /** Called every 1,000 lines and at the end; bytesRead against the upload size gives a percent. */
  onProgress?: (rowsDone: number, bytesRead: number) => void;
}

/** What is known before the first row: enough to show the mapping screen. */
export interface PriceListHead {
  headers: string[];
  headerLine: number;
  delimiter: Delimiter;
  /** As detected at the start; the summary has the final one (see PriceListDecoder). */
  encoding: TextEncodingName;
  bom: boolean;
  mapping: Mapping;
  mappingGuessed: boolean;
  /** Where the mapping came from: the caller, the supplier's remembered one, or the headers alone. */
  mappingSource: MappingSource;
  resolved: ResolvedMapping;
}

export type MappingSource = 'given' | 'remembered' | 'guessed';

export interface RejectedLine {
  line: number;
  errors: RowError[];
}

export interface DuplicatePart {
  brand: string;
  partNumberNorm: string;
  lines: number[];
}

export interface PriceListSummary {
  /** Non-blank lines after the header. */
  dataLines: number;
  /** Rows valid once duplicates are settled: `row` events minus retractedLines. */
  accepted: number;
  /** Lines rejected once duplicates are settled. */
  rejected: number;
  blankLines: number;
  duplicates: DuplicatePart[];
  /**
   * First occurrences of a duplicated part that were yielded as `row` before the second one
   * was read. They are rejected too: drop them from whatever the rows went into.
   */
  retractedLines: number[];
  /** The duplicate errors of those first occurrences (and of first occurrences already rejected). */
  lateErrors: RowError[];
  encoding: TextEncodingName;
  bytesRead: number;
}

export type PriceListEvent =
  | { type: 'row'; row: NormalisedRow }
  /** `cells` as read from the file, for the rejected-rows download. */
  | { type: 'rejected'; line: number; errors: RowError[]; cells: readonly string[] }
  | { type: 'end'; summary: PriceListSummary };

export interface PriceListParse {
  head: PriceListHead;
  /**
   * One event per data line, in file order, then `end`. Iterate once. It throws only
   * PriceListFileError for bad input, and may do so after rows were yielded (a NUL byte or the
   * size limit deep in the file): discard what was staged then.
   */
  events: AsyncGenerator<PriceListEvent, void, undefined>;
}

const SAMPLE_BYTES = 64 * 1024;
const PROGRESS_EVERY = 1000;

type Line = { cells: string[]; line: number };

/** Lines a record spans: 1 plus the line breaks inside its quoted fields (CRLF counts once). */
function linesSpanned(cells: readonly string[]): number {
  let lines = 1;
  for (const cell of cells) {
    if (cell.indexOf('\n') === -1 && cell.indexOf('\r') === -1) continue;
    lines += cell.match(/\r\n|\r|\n/g)?.length ?? 0;
  }
  return lines;
}

function isBlank(cells: readonly string[]): boolean {
  for (const cell of cells) if (cell !== '' && cell.trim() !== '') return false;
  return true;
}

function toFileError(err: unknown, line: number, maxRecordChars: number): unknown {
  if (err instanceof PriceListFileError || !(err instanceof CsvError)) return err;
  switch (err.code) {
    case 'CSV_MAX_RECORD_SIZE':
      return new PriceListFileError(
        'record-too-large',
        `The line starting at line ${line} is longer than ${maxRecordChars.toLocaleString('en-US')} characters; usually a quote that is never closed.`,
        { line },
      );
    case 'CSV_QUOTE_NOT_CLOSED':
      return new PriceListFileError('unclosed-quote', `A quote opened on line ${line} is never closed; the file may be cut off.`, { line });
    default:
      return new PriceListFileError('malformed', `The file cannot be read as CSV near line ${line}: ${err.message}`, { line });
  }
}

/**
 * Pulls records off csv-parse with read(), awaiting only when none is buffered (an async
 * iterator would cost a promise per line), and numbers them by physical line: csv-parse's own
 * count goes wrong on CRLF inside quotes, and the buyer looks lines up in the file.
 */
class LineReader {
  /** Physical line where the next record starts; the header is line 1 unless blank lines precede it. */
  private nextLine = 1;
  blankLines = 0;
  private ended = false;
  private failure: unknown = undefined;
  private wake: (() => void) | null = null;

  constructor(
    private readonly parser: Readable,
    private readonly maxRecordChars: number,
  ) {
    const wake = (): void => {
      const resolve = this.wake;
      this.wake = null;
      resolve?.();
    };
    parser.on('readable', wake);
    parser.on('error', (err) => {
      this.failure = err;
      wake();
    });
    for (const event of ['end', 'close']) {
      parser.on(event, () => {
        this.ended = true;
        wake();
      });
    }
  }

  /** The next non-blank record if one is buffered, null at the end, undefined to await read(). */
  take(): Line | null | undefined {
    for (;;) {
      // Records parsed before an error stay readable, so the error is raised at its own line.
      const cells = this.parser.read() as string[] | null;
      if (cells === null) {
        if (this.failure !== undefined) throw toFileError(this.failure, this.nextLine, this.maxRecordChars);
        return this.ended ? null : undefined;
      }
      const line = this.nextLine;
      this.nextLine += linesSpanned(cells);
      if (!isBlank(cells)) return { cells, line };
      this.blankLines++;
    }
  }

  async read(): Promise<Line | null> {
    for (;;) {
      const line = this.take();
      if (line !== undefined) return line;
      await new Promise<void>((resolve) => {
        this.wake = resolve;
      });
    }
  }
}

/**
 * Decodes the upload and picks the delimiter from its first 64 KiB, then hands those bytes and
 * the rest on as one UTF-8 stream. Whole-file refusals found in the sample reject here. The
 * upload's row count (count-rows.ts) reads through this too, so it sees the text the parser sees.
 */
export async function openText(
  input: Readable | Buffer,
  maxFileBytes: number,
  chosen?: Delimiter,
): Promise<{ decoder: PriceListDecoder; delimiter: Delimiter; text: Readable }> {
  if (Buffer.isBuffer(input) && input.length > maxFileBytes) {
    throw new PriceListFileError('too-large', `The file is larger than the limit of ${Math.round(maxFileBytes / 1024 / 1024)} MB.`);
  }
  const decoder = createDecodeStream({ maxBytes: maxFileBytes });
  // Errors reach the reader through the last stream of each pipeline; the callbacks need not act.
  pipeline(Buffer.isBuffer(input) ? Readable.from([input]) : input, decoder, () => {});
  const decoded = decoder[Symbol.asyncIterator]() as AsyncIterator<Buffer>;
  const sample: Buffer[] = [];
  let sampleBytes = 0;
  let ended = false;
  try {
    while (sampleBytes < SAMPLE_BYTES && !ended) {
      const next = await decoded.next();
      if (next.done) ended = true;
      else {
        sample.push(next.value);
        sampleBytes += next.value.length;
      }
    }
  } catch (err) {
    decoder.destroy();
    throw err;
  }
  async function* rest(): AsyncGenerator<Buffer> {
    yield* sample;
    if (ended) return;
    for (let next = await decoded.next(); !next.done; next = await decoded.next()) yield next.value;
  }
  const delimiter = chosen ?? detectDelimiter(Buffer.concat(sample).toString('utf8'), ended);
  return { decoder, delimiter, text: Readable.from(rest()) };
}

/**
 * Same part (brand folded for case and spacing, number normalised) on two lines: both lines are
 * rejected. The second is known when it is read; the first may already have been yielded as a
 * row, so it is reported at the end as retracted.
 */
class DuplicateTracker {
  /** Folded brand → normalised number → first line, negative when that line was rejected. */
  private readonly byBrand = new Map<string, Map<string, number>>();
  private readonly folded = new Map<string, string>();
  /** The brand as first printed, per folded form, to name a first occurrence afterwards. */
  private readonly printed = new Map<string, string>();
  /** Keyed by the signed first line of each duplicated part. */
  private readonly groups = new Map<number, DuplicatePart>();

  constructor(private readonly partHeader: string | null) {}

  /** Records a line's part; returns the duplicate error when the part was seen before. */
  check(brand: string, norm: string, line: number, accepted: boolean): RowError | null {
    const key = this.fold(brand);
    let parts = this.byBrand.get(key);
    if (parts === undefined) {
      parts = new Map();
      this.byBrand.set(key, parts);
      this.printed.set(key, brand);
    }
    const first = parts.get(norm);
    if (first === undefined) {
      parts.set(norm, accepted ? line : -line);
      return null;
    }
    const group = this.groups.get(first) ?? { brand: this.printed.get(key) ?? brand, partNumberNorm: norm, lines: [Math.abs(first)] };
    group.lines.push(line);
    this.groups.set(first, group);
    return this.error(line, `the same part (${brand} ${norm}) is also on line ${Math.abs(first)}; both lines are rejected`);
  }

  settle(): Pick<PriceListSummary, 'duplicates' | 'retractedLines' | 'lateErrors'> {
    const retractedLines: number[] = [];
    const lateErrors: RowError[] = [];
    for (const [first, group] of this.groups) {
      if (first > 0) retractedLines.push(first);
      const others = group.lines.slice(1);
      const listed = others.slice(0, 5).join(', ') + (others.length > 5 ? ` and ${others.length - 5} more` : '');
      const lines = others.length > 1 ? 'lines' : 'line';
      lateErrors.push(
        this.error(
          Math.abs(first),
          `the same part (${group.brand} ${group.partNumberNorm}) is also on ${lines} ${listed}; both lines are rejected`,
        ),
      );
    }
    retractedLines.sort((a, b) => a - b);
    lateErrors.sort((a, b) => a.line - b.line);
    return { duplicates: [...this.groups.values()], retractedLines, lateErrors };
  }

  private error(line: number, message: string): RowError {
    return { line, column: this.partHeader, field: 'partNumber', message };
  }

  /** Brands repeat on every line, so their folded form is cached (bounded: a file has few). */
  private fold(brand: string): string {
    let key = this.folded.get(brand);
    if (key === undefined) {
      key = brand.normalize('NFKC').toUpperCase().replace(/\s+/g, ' ');
      if (this.folded.size < 10_000) this.folded.set(brand, key);
    }
    return key;
  }
}

function checkHeaders(headers: string[], maxColumns: number): void {
  if (headers.length > maxColumns) {
    throw new PriceListFileError('too-many-columns', `The file has ${headers.length} columns; at most ${maxColumns} are read.`, {
      headers,
    });
  }
  const seen = new Set<string>();
  const repeated = new Set<string>();
  for (const header of headers) {
    const key = header.toLowerCase();
    if (key === '') continue;
    if (seen.has(key)) repeated.add(header);
    seen.add(key);
  }
  if (repeated.size > 0) {
    throw new PriceListFileError('duplicate-header', `The header names a column twice: ${[...repeated].join(', ')}. Rename one of them.`, {
      headers,
    });
  }
}

/**
 * The given mapping, else the remembered one carried onto these headers, else the guess. A
 * remembered mapping that no longer fits (the supplier changed its layout) gives way to the guess;
 * a refusal names the first candidate tried.
 */
function resolve(
  headers: string[],
  opts: Pick<ParseOptions, 'mapping' | 'rememberedMapping'>,
): { mapping: Mapping; resolved: ResolvedMapping; mappingSource: MappingSource } {
  const candidates: { mapping: Mapping; mappingSource: MappingSource }[] = opts.mapping
    ? [{ mapping: opts.mapping, mappingSource: 'given' }]
    : [
        ...(opts.rememberedMapping
          ? [{ mapping: applyRememberedMapping(headers, opts.rememberedMapping), mappingSource: 'remembered' as const }]
          : []),
        { mapping: guessMapping(headers), mappingSource: 'guessed' },
      ];
  let firstProblems: MappingProblem[] | null = null;
  for (const { mapping, mappingSource } of candidates) {
    const check = validateMapping(headers, mapping);
    if (check.ok) return { mapping, resolved: check.resolved, mappingSource };
    firstProblems ??= check.problems;
  }
  const problems = firstProblems ?? [];
  const missing = problems.some((p) => p.code === 'missing-required');
  throw new PriceListFileError(missing ? 'missing-column' : 'invalid-mapping', problems.map((p) => p.message).join('; '), {
    headers,
    mapping: candidates[0]?.mapping,
    problems,
  });
}

/** Header, mapping and the first data line, or the whole-file refusal they amount to. */
async function readHead(
  reader: LineReader,
  opts: ParseOptions,
): Promise<{
  headers: string[];
  headerLine: number;
  mapping: Mapping;
  mappingSource: MappingSource;
  resolved: ResolvedMapping;
  first: Line;
}> {
  const header = await reader.read();
  if (header === null) throw new PriceListFileError('empty', 'The file has no header and no rows.');
  reader.blankLines = 0;
  const headers = header.cells.map((h, i) => (i === 0 ? h.replace(/^\uFEFF/, '') : h).trim());
  checkHeaders(headers, PRICE_LIST_LIMITS.maxColumns);
  const { mapping, resolved, mappingSource } = resolve(headers, opts);
  const first = await reader.read();
  if (first === null) throw new PriceListFileError('header-only', 'The file has a header but no rows.', { headers });
  return { headers, headerLine: header.line, mapping, mappingSource, resolved, first };
}

/** How csv-parse reads a price list; RecordCounter (count-rows.ts) follows the same rules. */
export function csvParseOptions(delimiter: Delimiter, maxRecordChars: number): Options {
  return {
    delimiter,
    bom: false,
    relax_quotes: true,
    relax_column_count: true,
    skip_empty_lines: false,
    record_delimiter: ['\r\n', '\n', '\r'],
    max_record_size: maxRecordChars,
  };
}

export function tooManyRows(maxDataRows: number): PriceListFileError {
  return new PriceListFileError('too-many-rows', `The file has more than ${maxDataRows.toLocaleString('en-US')} rows.`);
}

/**
 * Parses a supplier price list as a stream: decode → detect delimiter → csv-parse → map →
 * validate, one line at a time, with memory bounded by the duplicate index (one short entry
 * per line) rather than by the file. Resolves once the header and the first data line are
 * read, so whole-file refusals (empty, binary, header only, missing column …) reject this
 * promise. The input stream is consumed and destroyed.
 */
export async function parsePriceList(input: Readable | Buffer, opts: ParseOptions = {}): Promise<PriceListParse> {
  const maxDataRows = opts.maxDataRows ?? PRICE_LIST_LIMITS.maxDataRows;
  const maxRecordChars = opts.maxRecordChars ?? PRICE_LIST_LIMITS.maxRecordChars;
  const { decoder, delimiter, text } = await openText(input, opts.maxFileBytes ?? PRICE_LIST_LIMITS.maxFileBytes, opts.delimiter);
  const parser = parse(csvParseOptions(delimiter, maxRecordChars));
  pipeline(text, parser, () => {});
  const reader = new LineReader(parser, maxRecordChars);
  const close = (): void => {
    parser.destroy();
    decoder.destroy();
  };

  let start: Awaited<ReturnType<typeof readHead>>;
  try {
    start = await readHead(reader, opts);
  } catch (err) {
    close();
    throw err;
  }
  const { first, ...known } = start;
  const head: PriceListHead = {
    ...known,
    delimiter,
    encoding: decoder.encoding,
    bom: decoder.bom,
    mappingGuessed: opts.mapping === undefined,
  };

  async function* events(): AsyncGenerator<PriceListEvent, void, undefined> {
    const validator = new RowValidator(head.resolved, { maxFieldChars: opts.maxFieldChars });
    const partColumn = head.resolved.columns.partNumber;
    const duplicates = new DuplicateTracker(partColumn === undefined ? null : head.headers[partColumn] || null);
    let dataLines = 0;
    let accepted = 0;
    try {
      for (let record: Line | null = first; record !== null; record = reader.take() ?? (await reader.read())) {
        // The upload's own count (count-rows.ts) refuses such a file as it arrives; this stays the rule for any other input.
        if (++dataLines > maxDataRows) throw tooManyRows(maxDataRows);
        const result = validator.validate(record.cells, record.line);
        const brand = result.ok ? result.row.brand : result.brand;
        const norm = result.ok ? result.row.partNumberNorm : result.partNumberNorm;
        const duplicate = brand !== null && norm !== null ? duplicates.check(brand, norm, record.line, result.ok) : null;
        if (result.ok && duplicate === null) {
          accepted++;
          yield { type: 'row', row: result.row };
        } else {
          const errors = result.ok ? [] : result.errors;
          yield { type: 'rejected', line: record.line, errors: duplicate ? [...errors, duplicate] : errors, cells: record.cells };
        }
        if (dataLines % PROGRESS_EVERY === 0) opts.onProgress?.(dataLines, decoder.bytesRead);
      }
      opts.onProgress?.(dataLines, decoder.bytesRead);
      const settled = duplicates.settle();
      const finalAccepted = accepted - settled.retractedLines.length;
      yield {
        type: 'end',
        summary: {
          dataLines,
          accepted: finalAccepted,
          rejected: dataLines - finalAccepted,
          blankLines: reader.blankLines,
          ...settled,
          encoding: decoder.encoding,
          bytesRead: decoder.bytesRead,
        },
      };
    } finally {
      close();
    }
  }

  return { head, events: events() };
}

export interface CollectedPriceList {
  head: PriceListHead;
  rows: NormalisedRow[];
  rejected: RejectedLine[];
  summary: PriceListSummary;
}

/**
 * The whole file in memory, duplicates settled and rejections in line order. For previews of
 * small files and for tests; a large import should consume `events` as a stream instead.
 */
export async function collectPriceList(input: Readable | Buffer, opts: ParseOptions = {}): Promise<CollectedPriceList> {
  const { head, events } = await parsePriceList(input, opts);
  const rows: NormalisedRow[] = [];
  const rejected = new Map<number, RejectedLine>();
  let summary: PriceListSummary | null = null;
  for await (const event of events) {
    if (event.type === 'row') rows.push(event.row);
    else if (event.type === 'rejected') rejected.set(event.line, { line: event.line, errors: event.errors });
    else summary = event.summary;
  }
  if (summary === null) throw new Error('price-list events ended without a summary');
  const retracted = new Set(summary.retractedLines);
  for (const error of summary.lateErrors) {
    const entry = rejected.get(error.line) ?? { line: error.line, errors: [] };
    entry.errors.push(error);
    rejected.set(error.line, entry);
  }
  return {
    head,
    rows: rows.filter((r) => !retracted.has(r.line)),
    rejected: [...rejected.values()].sort((a, b) => a.line - b.line),
    summary,
  };
}
