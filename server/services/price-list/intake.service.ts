import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import type { DataSource } from 'typeorm';
import { validateMapping, type Mapping } from '../../../shared/price-list/mapping';
import { formatDate } from '../../../shared/format';
import type { PriceListRecord } from '../../presenters/price-list.presenter';
import { AppError } from '../../errors';
import { audit } from '../audit.service';
import { diffStagedList, fieldHeaders } from './diff';
import { hasStoredFile, readFileChunks, sha256OfFile } from './file-store';
import { lockListOrRefuse, lockSupplier } from './locks';
import { getPriceList } from './queries';
import { stageList, type IntakeDeps } from './stage-list';

/** A list still "processing" with no progress for this long belongs to a server that died: shown as failed. */
const ABANDONED_AFTER = '10 minutes';

export interface UploadInput {
  supplierId: string;
  fileName: string;
  filePath: string;
  sizeBytes: number;
  mapping?: Mapping;
  /** The client's id for the list, so it can poll the progress. */
  id?: string;
  actorId: string | null;
  maxFileBytes: number;
  flagThresholdPct: number;
}

async function supplierMapping(ds: DataSource, supplierId: string): Promise<Mapping | null> {
  const rows = (await ds.query(`SELECT mapping FROM supplier WHERE id = $1`, [supplierId])) as { mapping: Mapping | null }[];
  if (!rows[0]) throw AppError.notFound('Supplier');
  return rows[0].mapping;
}

async function refuseCommittedFile(ds: DataSource, supplierId: string, sha256: string): Promise<void> {
  const rows = (await ds.query(
    `SELECT id, committed_at, file_name FROM price_list WHERE supplier_id = $1 AND sha256 = $2 AND status = 'committed'`,
    [supplierId, sha256],
  )) as { id: string; committed_at: Date; file_name: string }[];
  const done = rows[0];
  if (done) {
    throw AppError.conflict(
      `This same file (${done.file_name}) was committed for this supplier on ${formatDate(done.committed_at)}; nothing to do.`,
      { priceListId: done.id },
    );
  }
}

/** POST /api/price-lists: reads, checks, stages and compares a supplier's file. */
export async function uploadPriceList(deps: IntakeDeps, input: UploadInput): Promise<PriceListRecord> {
  const ds = deps.dataSource;
  const remembered = await supplierMapping(ds, input.supplierId);
  const sha256 = await sha256OfFile(input.filePath);
  await refuseCommittedFile(ds, input.supplierId, sha256);
  await ds.query(
    `UPDATE price_list SET status = 'failed' WHERE status = 'processing' AND updated_at < now() - interval '${ABANDONED_AFTER}'`,
  );
  const listId = input.id ?? randomUUID();
  await stageList(deps, {
    listId,
    supplierId: input.supplierId,
    open: () => createReadStream(input.filePath, { highWaterMark: 64 * 1024 }),
    sizeBytes: input.sizeBytes,
    mapping: input.mapping,
    rememberedMapping: remembered ?? undefined,
    maxFileBytes: input.maxFileBytes,
    flagThresholdPct: input.flagThresholdPct,
    create: { fileName: input.fileName, sha256, actorId: input.actorId, filePath: input.filePath },
  });
  return getPriceList(ds, listId);
}

interface StagedListFacts {
  supplier_id: string;
  status: string;
  columns: string[];
  mapping: Mapping;
  size_bytes: string;
  data_lines: number;
}

async function loadStaged(ds: DataSource, listId: string): Promise<StagedListFacts> {
  const rows = (await ds.query(`SELECT supplier_id, status, columns, mapping, size_bytes, data_lines FROM price_list WHERE id = $1`, [
    listId,
  ])) as StagedListFacts[];
  const list = rows[0];
  if (!list) throw AppError.notFound('Price list');
  if (list.status !== 'staged') throw AppError.conflict(`This price list is ${list.status}; only a staged list can be previewed again.`);
  return list;
}

function sameMapping(a: Mapping, b: Mapping): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  for (const key of keys) if ((a[key] ?? null) !== (b[key] ?? null)) return false;
  return true;
}

/** Compares the staged rows again with the catalog as it is now (the file is not read again). */
async function compareAgain(deps: IntakeDeps, listId: string, list: StagedListFacts, flagThresholdPct: number): Promise<void> {
  const check = validateMapping(list.columns, list.mapping);
  if (!check.ok) throw new Error(`price list ${listId} holds a mapping that does not fit its columns`);
  const client = await deps.pool.connect();
  let failed = false;
  try {
    await client.query('BEGIN');
    await lockListOrRefuse(client, listId);
    await lockSupplier(client, list.supplier_id);
    const diff = await diffStagedList(client, {
      listId,
      supplierId: list.supplier_id,
      flagThresholdPct,
      headers: fieldHeaders(check.resolved),
      dataLines: list.data_lines,
    });
    const updated = await client.query(
      `UPDATE price_list SET stale = false, counts = $2, flagged = $3, flag_threshold_pct = $4, updated_at = now()
        WHERE id = $1 AND status = 'staged'`,
      [listId, JSON.stringify(diff.counts), diff.flagged, flagThresholdPct],
    );
    if (updated.rowCount !== 1) throw AppError.conflict('This price list was committed or discarded meanwhile.');
    await client.query('COMMIT');
  } catch (err) {
    failed = true;
    await client.query('ROLLBACK').catch(() => undefined);
    throw err;
  } finally {
    client.release(failed);
  }
}

/**
 * POST /api/price-lists/:id/preview: a stale list compared again with the current catalog, or,
 * with a new mapping, the kept file read again with it.
 */
export async function previewPriceList(
  deps: IntakeDeps,
  input: { id: string; mapping?: Mapping; maxFileBytes: number; flagThresholdPct: number },
): Promise<PriceListRecord> {
  const ds = deps.dataSource;
  const list = await loadStaged(ds, input.id);
  if (input.mapping && !sameMapping(input.mapping, list.mapping)) {
    if (!(await hasStoredFile(ds, input.id))) throw AppError.conflict('The uploaded file is no longer kept: upload it again.');
    await stageList(deps, {
      listId: input.id,
      supplierId: list.supplier_id,
      open: () => readFileChunks(ds, input.id),
      sizeBytes: Number(list.size_bytes),
      mapping: input.mapping,
      // A stored file was under the limit when it came; a lower limit since then does not refuse it.
      maxFileBytes: Math.max(input.maxFileBytes, Number(list.size_bytes)),
      flagThresholdPct: input.flagThresholdPct,
    });
  } else {
    await compareAgain(deps, input.id, list, input.flagThresholdPct);
  }
  return getPriceList(ds, input.id);
}

/** POST /api/price-lists/:id/discard: the catalog is not touched; the staged rows and the kept file go. */
export async function discardPriceList(ds: DataSource, listId: string, actorId: string | null): Promise<PriceListRecord> {
  await ds.transaction(async (m) => {
    await lockListOrRefuse(m, listId);
    const rows = (await m.query(`SELECT status, file_name FROM price_list WHERE id = $1 FOR UPDATE`, [listId])) as {
      status: string;
      file_name: string;
    }[];
    const list = rows[0];
    if (!list) throw AppError.notFound('Price list');
    if (list.status !== 'staged') throw AppError.conflict(`This price list is ${list.status}; only a staged list can be discarded.`);
    await m.query(`UPDATE price_list SET status = 'discarded', discarded_by = $2, discarded_at = now(), updated_at = now() WHERE id = $1`, [
      listId,
      actorId,
    ]);
    await m.query(`DELETE FROM price_list_row WHERE price_list_id = $1`, [listId]);
    await m.query(`DELETE FROM price_list_file_chunk WHERE price_list_id = $1`, [listId]);
    await audit(m, {
      actorId,
      action: 'price-list.discard',
      entityType: 'price_list',
      entityId: listId,
      data: { fileName: list.file_name },
    });
  });
  return getPriceList(ds, listId);
}
