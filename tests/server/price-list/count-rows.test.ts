import { Readable } from 'node:stream';
import { parse } from 'csv-parse/sync';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { countDataLines, RecordCounter } from '../../../server/services/price-list/count-rows';
import { DELIMITERS, type Delimiter } from '../../../server/services/price-list/delimiter';
import { collectPriceList, csvParseOptions, PriceListFileError } from '../../../server/services/price-list/parse';

/** The reference: csv-parse itself, with the intake's options, counting records that are not blank. */
function csvParseRecords(text: string, delimiter: Delimiter): number | null {
  let records: string[][];
  try {
    records = parse(text, csvParseOptions(delimiter, 1_000_000)) as string[][];
  } catch {
    return null;
  }
  return records.filter((cells) => cells.some((c) => c.trim() !== '')).length;
}

/** The counter fed in pieces of the given size, so quotes and CRLF fall across chunk ends. */
function counted(text: string, delimiter: Delimiter, piece: number): number {
  const counter = new RecordCounter(delimiter);
  const bytes = Buffer.from(text);
  for (let i = 0; i < bytes.length; i += piece) counter.write(bytes.subarray(i, i + piece));
  counter.end();
  return counter.records;
}

const ASCII_PIECES = ['a', 'B7', ' ', ',', ';', '\t', '"', '""', '\n', '\r', '\r\n', 'x"y', ' "'];

describe('row count of an upload, as csv-parse reads it', () => {
  it('equals csv-parse’s count of non-blank records on any ASCII text it reads (property, fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.constantFrom(...ASCII_PIECES), { maxLength: 60 }).map((parts) => parts.join('')),
        fc.constantFrom(...DELIMITERS),
        fc.integer({ min: 1, max: 7 }),
        (text, delimiter, piece) => {
          const reference = csvParseRecords(text, delimiter);
          fc.pre(reference !== null);
          expect(counted(text, delimiter, piece)).toBe(reference);
        },
      ),
      { numRuns: 3000 },
    );
  });

  it('never counts more than csv-parse with non-ASCII text, spaces that trim() removes included', () => {
    fc.assert(
      fc.property(
        fc.array(fc.constantFrom(...ASCII_PIECES, 'é', '\u00a0', '\u3000', 'Ω'), { maxLength: 60 }).map((parts) => parts.join('')),
        fc.constantFrom(...DELIMITERS),
        (text, delimiter) => {
          const reference = csvParseRecords(text, delimiter);
          fc.pre(reference !== null);
          expect(counted(text, delimiter, 3)).toBeLessThanOrEqual(reference!);
        },
      ),
      { numRuns: 3000 },
    );
  });

  it('counts data lines as the parser numbers them: blank lines and the header left out', async () => {
    const text =
      '\n \nPart No,Brand,Cost,List\n\nAX-1,Arcfire,1.00,2.00\r\n,,,\n"AX-2","Arcfire","1.00","2.00"\r"A""X-3",Arcfire,1.00,2.00';
    const parsed = await collectPriceList(Buffer.from(text));
    expect(parsed.summary.dataLines).toBe(3);
    expect(await countDataLines(Readable.from([Buffer.from(text)]))).toBe(3);
  });

  it('refuses with the parser’s own too-many-rows error as soon as the limit is passed', async () => {
    let served = 0;
    async function* rows(): AsyncGenerator<Buffer> {
      yield Buffer.from('Part No,Brand,Cost,List\n');
      for (let i = 0; i < 20_000; i++) {
        served++;
        yield Buffer.from(`AX-${i},Arcfire,1.00,2.00\n`);
      }
    }
    const err = await countDataLines(Readable.from(rows()), { maxDataRows: 10 }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(PriceListFileError);
    expect((err as PriceListFileError).code).toBe('too-many-rows');
    expect((err as PriceListFileError).message).toBe('The file has more than 10 rows.');
    // It stopped reading near the limit, not at the end of the file (the decoder holds back its first 64 KiB).
    expect(served).toBeLessThan(10_000);
  });
});
