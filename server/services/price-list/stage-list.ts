import type { Readable } from 'node:stream';
import type pg from 'pg';
import type { DataSource } from 'typeorm';
import type { Mapping } from '../../../shared/price-list/mapping';
import { AppError } from '../../errors';
import { deleteStagedRows } from '../../repositories/price-list-rows.repository';
import { deleteProcessingList, insertProcessingList, markStaged } from '../../repositories/price-lists.repository';
import { diffStagedList, fieldHeaders } from './diff';
import { asAppError } from './file-refusal';
import { storeFileChunks } from './file-store';
import { lockListOrRefuse, lockSupplier } from './locks';
import type { Delimiter } from './delimiter';
import { parsePriceList, type PriceListParse } from './parse';
import { ProgressReporter } from './progress';
import { stageRows } from './stage-rows';

export interface IntakeDeps {
  dataSource: DataSource;
  pool: pg.Pool;
}

export interface StageRun {
  listId: string;
  supplierId: string;
  /** The file's bytes; opened once. */
  open: () => Readable;
  sizeBytes: number;
  mapping?: Mapping;
  rememberedMapping?: Mapping;
  /** The buyer's delimiter; guessed when absent. */
  delimiter?: Delimiter;
  maxFileBytes: number;
  flagThresholdPct: number;
  /** A first upload: the price_list row is created once the header is read, and the file kept. */
  create?: { fileName: string; sha256: string; actorId: string | null; filePath: string };
}

/** Ends a parse that may not have started: running it to its first line lets its own cleanup close the file. */
async function closeParse(parsed: PriceListParse): Promise<void> {
  try {
    await parsed.events.next();
  } catch {
    // A refusal here only means the parser had already stopped.
  }
  await parsed.events.return();
}

async function createProcessingList(ds: DataSource, run: StageRun, create: NonNullable<StageRun['create']>): Promise<void> {
  try {
    await insertProcessingList(ds.manager, {
      id: run.listId,
      supplierId: run.supplierId,
      fileName: create.fileName,
      sha256: create.sha256,
      sizeBytes: run.sizeBytes,
      progress: { phase: 'reading', rowsDone: 0, bytesRead: 0, bytesTotal: run.sizeBytes },
      createdBy: create.actorId,
    });
  } catch (err) {
    if ((err as { code?: string }).code === '23505') throw AppError.conflict('An upload with this id exists already.');
    throw err;
  }
}

/**
 * Reads a file into the staging table and compares it with the catalog, all in one
 * transaction: parse → COPY (side by side) → keep the bytes → diff → mark staged. A refusal or
 * a failure anywhere leaves what was there before: no row of a first upload, the previous
 * staging of a list previewed again.
 */
export async function stageList(deps: IntakeDeps, run: StageRun): Promise<void> {
  const ds = deps.dataSource;
  const progress = new ProgressReporter(ds, run.sizeBytes);
  let parsed: PriceListParse;
  try {
    parsed = await parsePriceList(run.open(), {
      mapping: run.mapping,
      rememberedMapping: run.rememberedMapping,
      delimiter: run.delimiter,
      maxFileBytes: run.maxFileBytes,
      onProgress: progress.report,
    });
  } catch (err) {
    throw asAppError(err, run.maxFileBytes);
  }
  if (run.create) {
    try {
      await createProcessingList(ds, run, run.create);
    } catch (err) {
      await closeParse(parsed);
      throw err;
    }
  }
  progress.listId = run.listId;

  const client = await deps.pool.connect();
  let failed = false;
  try {
    await client.query('BEGIN');
    await lockListOrRefuse(client, run.listId);
    if (!run.create) await deleteStagedRows(client, run.listId, { errors: true });
    const { summary } = await stageRows(client, run.listId, parsed);
    if (run.create) await storeFileChunks(client, run.listId, run.create.filePath);
    progress.comparing(summary.dataLines);
    await lockSupplier(client, run.supplierId);
    const { head } = parsed;
    const diff = await diffStagedList(client, {
      listId: run.listId,
      supplierId: run.supplierId,
      flagThresholdPct: run.flagThresholdPct,
      headers: fieldHeaders(head.resolved),
      dataLines: summary.dataLines,
    });
    await progress.close();
    const staged = await markStaged(client, run.listId, {
      encoding: summary.encoding,
      delimiter: head.delimiter,
      columns: head.headers,
      mapping: head.mapping,
      mappingSource: head.mappingSource,
      dataLines: summary.dataLines,
      counts: diff.counts,
      flagged: diff.flagged,
      flagThresholdPct: run.flagThresholdPct,
      progress: progress.done(summary.dataLines),
    });
    if (!staged) throw AppError.conflict('This price list was committed or discarded meanwhile.');
    await client.query('COMMIT');
  } catch (err) {
    failed = true;
    await closeParse(parsed);
    await progress.close();
    await client.query('ROLLBACK').catch(() => undefined);
    if (run.create) {
      await deleteProcessingList(ds.manager, run.listId).catch(() => undefined);
    }
    throw asAppError(err, run.maxFileBytes);
  } finally {
    // A connection that failed mid-COPY is not handed back to the pool.
    client.release(failed);
  }
}
