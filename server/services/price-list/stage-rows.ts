import { once } from 'node:events';
import { finished } from 'node:stream/promises';
import type pg from 'pg';
import { from as copyFrom, type CopyStreamQuery } from 'pg-copy-streams';
import type { PriceListParse, PriceListSummary } from './parse';
import { copyLine, STAGING_COPY_SQL } from './copy-rows';
import { insertFileRowErrors, retractLines, type RowErrorEntry } from '../../repositories/price-list-rows.repository';
import { toEntries } from './row-errors';

/** COPY text handed to the socket in pieces of about this many characters. */
const WRITE_CHARS = 128 * 1024;
/**
 * Rejected-line reasons held before they are written. COPY holds the connection, so the COPY is
 * ended, the batch inserted and a new COPY begun: the errors stay in the staging transaction and
 * memory stays bounded whatever the file.
 */
const ERROR_BATCH = 2000;

class StagingCopy {
  private stream: CopyStreamQuery;
  private buffer = '';
  rows = 0;

  constructor(private readonly client: pg.PoolClient) {
    this.stream = this.open();
  }

  async push(line: string): Promise<void> {
    this.buffer += line;
    this.rows++;
    if (this.buffer.length >= WRITE_CHARS) await this.flush();
  }

  /** Ends the COPY running now; `reopen` starts the next one. */
  async end(): Promise<void> {
    const stream = this.stream;
    stream.end(this.buffer);
    this.buffer = '';
    await finished(stream);
  }

  reopen(): void {
    this.stream = this.open();
  }

  /** Sends CopyFail, so PostgreSQL drops what this COPY took, and waits for its answer. */
  async abort(err: Error): Promise<void> {
    this.stream.destroy(err);
    await finished(this.stream).catch(() => undefined);
  }

  private open(): CopyStreamQuery {
    const stream = this.client.query(copyFrom(STAGING_COPY_SQL));
    // Its errors reach the caller through finished() or abort(); none may go unheard.
    stream.on('error', () => undefined);
    return stream;
  }

  private async flush(): Promise<void> {
    const chunk = this.buffer;
    this.buffer = '';
    // Parsing goes on while PostgreSQL takes the rows; only a full socket buffer makes it wait.
    if (!this.stream.write(chunk)) await once(this.stream, 'drain');
  }
}

export interface StagedRows {
  summary: PriceListSummary;
  /** Rows COPY took: accepted rows plus the retracted first lines of duplicates. */
  copied: number;
}

/**
 * Streams a parsed file into price_list_row (valid rows) and price_list_row_error (reasons),
 * inside the caller's transaction on `client`, while the parser reads on. The first lines of
 * parts found twice are marked retracted once the file is read (the parser only knows then).
 */
export async function stageRows(client: pg.PoolClient, listId: string, parsed: PriceListParse): Promise<StagedRows> {
  const copy = new StagingCopy(client);
  let errors: RowErrorEntry[] = [];
  let summary: PriceListSummary | null = null;
  try {
    for await (const event of parsed.events) {
      if (event.type === 'row') {
        await copy.push(copyLine(listId, event.row));
      } else if (event.type === 'rejected') {
        errors.push(...toEntries(event.errors, event.cells));
        if (errors.length >= ERROR_BATCH) {
          await copy.end();
          await insertFileRowErrors(client, listId, errors);
          errors = [];
          copy.reopen();
        }
      } else {
        summary = event.summary;
      }
    }
    await copy.end();
  } catch (err) {
    await copy.abort(err instanceof Error ? err : new Error(String(err)));
    throw err;
  }
  if (summary === null) throw new Error('price-list events ended without a summary');
  await insertFileRowErrors(client, listId, [...errors, ...toEntries(summary.lateErrors, null)]);
  await retractLines(client, listId, summary.retractedLines);
  return { summary, copied: copy.rows };
}
