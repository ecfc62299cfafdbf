import type { Readable } from 'node:stream';
import type pg from 'pg';
import type { DataSource } from 'typeorm';
import type { Mapping } from '../../../shared/price-list/mapping';
import { AppError } from '../../errors';
import { diffStagedList, fieldHeaders } from './diff';
import { asAppError } from './file-refusal';
import { storeFileChunks } from './file-store';
import { lockListOrRefuse, lockSupplier } from './locks';
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

async function insertProcessingList(ds: DataSource, run: StageRun, create: NonNullable<StageRun['create']>): Promise<void> {
  try {
    await ds.query(
      `INSERT INTO price_list (id, supplier_id, file_name, sha256, size_bytes, status, progress, created_by)
       VALUES ($1, $2, $3, $4, $5, 'processing', $6, $7)`,
      [
        run.listId,
        run.supplierId,
        create.fileName,
        create.sha256,
        run.sizeBytes,
        JSON.stringify({ phase: 'reading', rowsDone: 0, bytesRead: 0, bytesTotal: run.sizeBytes }),
        create.actorId,
      ],
    );
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
      maxFileBytes: run.maxFileBytes,
      onProgress: progress.report,
    });
  } catch (err) {
    throw asAppError(err, run.maxFileBytes);
  }
  if (run.create) {
    try {
      await insertProcessingList(ds, run, run.create);
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
    if (!run.create) {
      await client.query(`DELETE FROM price_list_row WHERE price_list_id = $1`, [run.listId]);
      await client.query(`DELETE FROM price_list_row_error WHERE price_list_id = $1`, [run.listId]);
    }
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
    const updated = await client.query(
      `UPDATE price_list SET status = 'staged', stale = false, encoding = $2, delimiter = $3, columns = $4, mapping = $5,
              mapping_source = $6, data_lines = $7, counts = $8, flagged = $9, flag_threshold_pct = $10, progress = $11, updated_at = now()
        WHERE id = $1 AND status IN ('processing', 'staged')`,
      [
        run.listId,
        summary.encoding,
        head.delimiter,
        JSON.stringify(head.headers),
        JSON.stringify(head.mapping),
        head.mappingSource,
        summary.dataLines,
        JSON.stringify(diff.counts),
        diff.flagged,
        run.flagThresholdPct,
        JSON.stringify(progress.done(summary.dataLines)),
      ],
    );
    if (updated.rowCount !== 1) throw AppError.conflict('This price list was committed or discarded meanwhile.');
    await client.query('COMMIT');
  } catch (err) {
    failed = true;
    await closeParse(parsed);
    await progress.close();
    await client.query('ROLLBACK').catch(() => undefined);
    if (run.create) {
      await ds.query(`DELETE FROM price_list WHERE id = $1 AND status = 'processing'`, [run.listId]).catch(() => undefined);
    }
    throw asAppError(err, run.maxFileBytes);
  } finally {
    // A connection that failed mid-COPY is not handed back to the pool.
    client.release(failed);
  }
}
