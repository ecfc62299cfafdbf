import { isAscii, isUtf8 } from 'node:buffer';
import { Transform, type TransformCallback } from 'node:stream';
import iconv from 'iconv-lite';
import { PRICE_LIST_LIMITS } from '../../../shared/price-list/fields';
import type { Mapping, MappingProblem } from '../../../shared/price-list/mapping';

/** Why a whole file is refused. Each maps to a 4xx with `message` shown to the buyer. */
export const PRICE_LIST_FILE_ERROR_CODES = [
  'empty',
  'binary',
  'too-large',
  'header-only',
  'duplicate-header',
  'too-many-columns',
  'missing-column',
  'invalid-mapping',
  'too-many-rows',
  'record-too-large',
  'unclosed-quote',
  'malformed',
] as const;
export type PriceListFileErrorCode = (typeof PRICE_LIST_FILE_ERROR_CODES)[number];

export interface PriceListFileErrorDetails {
  line?: number;
  headers?: string[];
  /** With missing-column and invalid-mapping: the mapping tried, for the mapping screen. */
  mapping?: Mapping;
  problems?: MappingProblem[];
}

/** A file refused as a whole. Anything else thrown by the intake is a defect, not bad input. */
export class PriceListFileError extends Error {
  override readonly name = 'PriceListFileError';
  constructor(
    readonly code: PriceListFileErrorCode,
    message: string,
    readonly details: PriceListFileErrorDetails = {},
  ) {
    super(message);
  }
}

export type TextEncodingName = 'utf-8' | 'utf-16le' | 'utf-16be' | 'windows-1252';

export interface DecodeOptions {
  maxBytes?: number;
  /** Bytes held back before anything is emitted, to decide encoding and spot binary files. */
  sniffBytes?: number;
}

const SNIFF_BYTES = 64 * 1024;
const BINARY_SIGNATURES: [number[], string][] = [
  [[0x50, 0x4b, 0x03, 0x04], 'an Excel workbook or ZIP archive (.xlsx, .zip); save it as CSV'],
  [[0xd0, 0xcf, 0x11, 0xe0], 'an old Excel workbook (.xls); save it as CSV'],
  [[0x25, 0x50, 0x44, 0x46], 'a PDF'],
  [[0x1f, 0x8b], 'a gzip archive'],
];

function startsWith(buf: Buffer, bytes: number[]): boolean {
  return buf.length >= bytes.length && bytes.every((b, i) => buf[i] === b);
}

/** Share of control characters other than tab, CR, LF and form feed; text files have next to none. */
function controlRatio(codes: ArrayLike<number>, length: number): number {
  let control = 0;
  for (let i = 0; i < length; i++) {
    const c = codes[i] ?? 0;
    if ((c < 0x20 && c !== 9 && c !== 10 && c !== 12 && c !== 13) || c === 0x7f) control++;
  }
  return control < 3 ? 0 : control / length;
}

const MAX_CONTROL_RATIO = 0.02;

function binary(reason: string): PriceListFileError {
  return new PriceListFileError('binary', `This is not a text CSV file: ${reason}.`);
}

/** UTF-16 without a BOM shows as every other byte zero in ASCII-heavy text. */
function bomlessUtf16(sample: Buffer): 'utf-16le' | 'utf-16be' | null {
  const n = Math.min(sample.length, 4096) & ~1;
  if (n < 8) return null;
  let evenZero = 0;
  let oddZero = 0;
  for (let i = 0; i < n; i += 2) {
    if (sample[i] === 0) evenZero++;
    if (sample[i + 1] === 0) oddZero++;
  }
  const half = n / 2;
  if (oddZero > 0.9 * half && evenZero < 0.1 * half) return 'utf-16le';
  if (evenZero > 0.9 * half && oddZero < 0.1 * half) return 'utf-16be';
  return null;
}

/** Bytes at the end of a buffer that begin a UTF-8 sequence the next chunk completes. */
function completeUtf8Length(buf: Buffer): number {
  const n = buf.length;
  for (let back = 1; back <= Math.min(3, n); back++) {
    const b = buf[n - back] ?? 0;
    if ((b & 0xc0) === 0x80) continue;
    if (b < 0xc0) return n;
    const need = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : 2;
    return need > back ? n - back : n;
  }
  return n;
}

/**
 * Valid multi-byte UTF-8 sequences against bytes that fit none. Windows-1252 text almost never
 * forms a valid sequence by accident, so a chunk with more valid than invalid is UTF-8 with a
 * few bad bytes (pasted from elsewhere), not Windows-1252.
 */
function utf8Evidence(buf: Buffer): { valid: number; invalid: number } {
  let valid = 0;
  let invalid = 0;
  for (let i = 0; i < buf.length; i++) {
    const b = buf[i] ?? 0;
    if (b < 0x80) continue;
    const need = b >= 0xc2 && b <= 0xdf ? 1 : b >= 0xe0 && b <= 0xef ? 2 : b >= 0xf0 && b <= 0xf4 ? 3 : -1;
    let ok = need > 0 && i + need < buf.length;
    for (let k = 1; ok && k <= need; k++) ok = ((buf[i + k] ?? 0) & 0xc0) === 0x80;
    if (ok) {
      valid++;
      i += need;
    } else {
      invalid++;
    }
  }
  return { valid, invalid };
}

/**
 * Turns the uploaded bytes into UTF-8 for csv-parse, whatever the supplier's encoding: UTF-8
 * with or without BOM, UTF-16 LE/BE (BOM, or recognised without one), else Windows-1252.
 * UTF-8 input passes through untouched (the common case costs one validity check per chunk).
 *
 * A file that is pure ASCII for its first 64 KiB and then has a byte that is not UTF-8 was
 * written in Windows-1252 (the usual "Zündspule on row 9,000"): the decoder switches then, and
 * what it already emitted is the same in both. Invalid bytes after real UTF-8 (or outnumbered
 * by real UTF-8 in the same chunk) become U+FFFD, which the row checks reject line by line.
 */
export class PriceListDecoder extends Transform {
  encoding: TextEncodingName = 'utf-8';
  bom = false;
  bytesRead = 0;
  private readonly maxBytes: number;
  private readonly sniffBytes: number;
  private mode: 'sniff' | 'ascii' | 'utf8' | 'iconv' = 'sniff';
  private pending: Buffer[] = [];
  private pendingBytes = 0;
  private carry: Buffer | null = null;
  private decoder: iconv.DecoderStream | null = null;
  private contentBytes = 0;

  constructor(opts: DecodeOptions = {}) {
    super();
    this.maxBytes = opts.maxBytes ?? PRICE_LIST_LIMITS.maxFileBytes;
    this.sniffBytes = opts.sniffBytes ?? SNIFF_BYTES;
  }

  override _transform(chunk: Buffer, _encoding: BufferEncoding, done: TransformCallback): void {
    try {
      this.bytesRead += chunk.length;
      if (this.bytesRead > this.maxBytes) {
        throw new PriceListFileError('too-large', `The file is larger than the limit of ${Math.round(this.maxBytes / 1024 / 1024)} MB.`);
      }
      if (this.mode === 'sniff') {
        this.pending.push(chunk);
        this.pendingBytes += chunk.length;
        if (this.pendingBytes >= this.sniffBytes) this.decide();
      } else {
        this.feed(chunk);
      }
      done();
    } catch (err) {
      done(err as Error);
    }
  }

  override _flush(done: TransformCallback): void {
    try {
      if (this.mode === 'sniff') this.decide();
      if (this.mode === 'ascii' && this.carry !== null) {
        // A sequence cut off by the end of the file is not UTF-8.
        this.switchToWindows1252(this.carry);
        this.carry = null;
      }
      const rest = this.decoder?.end();
      if (rest) this.emitText(rest);
      if (this.contentBytes === 0) throw new PriceListFileError('empty', 'The file is empty.');
      done();
    } catch (err) {
      done(err as Error);
    }
  }

  private decide(): void {
    let sample = Buffer.concat(this.pending);
    this.pending = [];
    if (startsWith(sample, [0xef, 0xbb, 0xbf])) {
      this.bom = true;
      sample = sample.subarray(3);
    } else if (startsWith(sample, [0xff, 0xfe]) || startsWith(sample, [0xfe, 0xff])) {
      this.bom = true;
      this.startUtf16(sample[0] === 0xff ? 'utf-16le' : 'utf-16be', sample.subarray(2));
      return;
    } else {
      const utf16 = bomlessUtf16(sample);
      if (utf16) {
        this.startUtf16(utf16, sample);
        return;
      }
    }
    for (const [signature, what] of BINARY_SIGNATURES) {
      if (startsWith(sample, signature)) throw binary(`it looks like ${what}`);
    }
    if (sample.indexOf(0) !== -1) throw binary('it contains NUL bytes');
    if (controlRatio(sample, Math.min(sample.length, 8192)) > MAX_CONTROL_RATIO) {
      throw binary('it is full of control characters');
    }
    this.mode = this.bom ? 'utf8' : 'ascii';
    this.feed(sample);
  }

  private startUtf16(encoding: 'utf-16le' | 'utf-16be', body: Buffer): void {
    this.encoding = encoding;
    this.mode = 'iconv';
    this.decoder = iconv.getDecoder(encoding, { stripBOM: false });
    const text = this.decoder.write(body);
    const codes = Array.from(text.slice(0, 8192), (c) => c.charCodeAt(0));
    if (controlRatio(codes, codes.length) > MAX_CONTROL_RATIO) {
      throw binary('it is full of control characters');
    }
    this.emitText(text);
  }

  private feed(chunk: Buffer): void {
    if (this.mode === 'iconv') {
      this.emitText(this.decoder?.write(chunk) ?? '');
      return;
    }
    if (chunk.indexOf(0) !== -1) throw binary('it contains NUL bytes');
    if (this.mode === 'utf8') {
      this.emitBytes(chunk);
      return;
    }
    const buf = this.carry === null ? chunk : Buffer.concat([this.carry, chunk]);
    this.carry = null;
    if (isAscii(buf)) {
      this.emitBytes(buf);
      return;
    }
    const complete = completeUtf8Length(buf);
    const head = buf.subarray(0, complete);
    if (!isUtf8(head)) {
      const evidence = utf8Evidence(head);
      if (evidence.valid > 0 && evidence.valid >= evidence.invalid) {
        this.mode = 'utf8';
        this.emitBytes(buf);
      } else {
        this.switchToWindows1252(buf);
      }
    } else if (isAscii(head)) {
      this.emitBytes(head);
      this.carry = Buffer.from(buf.subarray(complete));
    } else {
      this.mode = 'utf8';
      this.emitBytes(buf);
    }
  }

  private switchToWindows1252(buf: Buffer): void {
    this.encoding = 'windows-1252';
    this.mode = 'iconv';
    this.decoder = iconv.getDecoder('windows-1252');
    this.emitText(this.decoder.write(buf));
  }

  private emitText(text: string): void {
    if (text.includes('\0')) throw binary('it contains NUL characters');
    if (text.length > 0) this.emitBytes(Buffer.from(text, 'utf8'));
  }

  private emitBytes(buf: Buffer): void {
    if (buf.length === 0) return;
    this.contentBytes += buf.length;
    this.push(buf);
  }
}

export function createDecodeStream(opts: DecodeOptions = {}): PriceListDecoder {
  return new PriceListDecoder(opts);
}
