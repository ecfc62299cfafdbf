import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import type { DataSource } from 'typeorm';
import { isDelimiter, type Delimiter } from '../../../shared/price-list/delimiters';
import { validateMapping, type Mapping } from '../../../shared/price-list/mapping';
import { formatDate } from '../../../shared/format';
import { AppError } from '../../errors';
import { audit } from '../../repositories/audit.repository';
import { deleteFileChunks } from '../../repositories/price-list-files.repository';
import { deleteStagedRows } from '../../repositories/price-list-rows.repository';
import {
  committedListOfFile,
  failAbandonedLists,
  markCompared,
  markDiscarded,
  stagedFacts,
  type PriceListRow,
  type StagedFacts,
} from '../../repositories/price-lists.repository';
import { rememberedMapping } from '../../repositories/suppliers.repository';
import { intakeSettings } from '../settings.service';
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
  delimiter?: Delimiter;
  /** The client's id for the list, so it can poll the progress. */
  id?: string;
  actorId: string | null;
  maxFileBytes: number;
  flagThresholdPct: number;
}

async function supplierMapping(ds: DataSource, supplierId: string): Promise<Mapping | null> {
  const mapping = await rememberedMapping(ds.manager, supplierId);
  if (mapping === undefined) throw AppError.notFound('Supplier');
  return mapping;
}

async function refuseCommittedFile(ds: DataSource, supplierId: string, sha256: string): Promise<void> {
  const done = await committedListOfFile(ds.manager, supplierId, sha256);
  if (done) {
    throw AppError.conflict(
      `This same file (${done.file_name}) was committed for this supplier on ${formatDate(done.committed_at)}; nothing to do.`,
      { priceListId: done.id },
    );
  }
}

/** POST /api/price-lists: reads, checks, stages and compares a supplier's file. */
export async function uploadPriceList(deps: IntakeDeps, input: UploadInput): Promise<PriceListRow> {
  const ds = deps.dataSource;
  const remembered = await supplierMapping(ds, input.supplierId);
  const sha256 = await sha256OfFile(input.filePath);
  await refuseCommittedFile(ds, input.supplierId, sha256);
  await failAbandonedLists(ds.manager, ABANDONED_AFTER);
  const listId = input.id ?? randomUUID();
  await stageList(deps, {
    listId,
    supplierId: input.supplierId,
    open: () => createReadStream(input.filePath, { highWaterMark: 64 * 1024 }),
    sizeBytes: input.sizeBytes,
    mapping: input.mapping,
    rememberedMapping: remembered ?? undefined,
    delimiter: input.delimiter,
    maxFileBytes: input.maxFileBytes,
    flagThresholdPct: input.flagThresholdPct,
    create: { fileName: input.fileName, sha256, actorId: input.actorId, filePath: input.filePath },
  });
  return getPriceList(ds, listId);
}

/** A list that can be previewed again: staged, so its data lines are counted. */
type StagedList = StagedFacts & { data_lines: number };

async function loadStaged(ds: DataSource, listId: string): Promise<StagedList> {
  const list = await stagedFacts(ds.manager, listId);
  if (!list) throw AppError.notFound('Price list');
  if (list.status !== 'staged' || list.data_lines === null)
    throw AppError.conflict(`This price list is ${list.status}; only a staged list can be previewed again.`);
  return { ...list, data_lines: list.data_lines };
}

function sameMapping(a: Mapping, b: Mapping): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  for (const key of keys) if ((a[key] ?? null) !== (b[key] ?? null)) return false;
  return true;
}

/** Compares the staged rows again with the catalog as it is now (the file is not read again). */
async function compareAgain(deps: IntakeDeps, listId: string, list: StagedList, flagThresholdPct: number): Promise<void> {
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
    const compared = await markCompared(client, listId, { counts: diff.counts, flagged: diff.flagged, flagThresholdPct });
    if (!compared) throw AppError.conflict('This price list was committed or discarded meanwhile.');
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
  input: { id: string; mapping?: Mapping; delimiter?: Delimiter },
): Promise<PriceListRow> {
  const ds = deps.dataSource;
  const { maxFileBytes, flagThresholdPct } = await intakeSettings(ds);
  const list = await loadStaged(ds, input.id);
  const newDelimiter = input.delimiter !== undefined && input.delimiter !== list.delimiter;
  if (newDelimiter || (input.mapping && !sameMapping(input.mapping, list.mapping))) {
    if (!(await hasStoredFile(ds, input.id))) throw AppError.conflict('The uploaded file is no longer kept: upload it again.');
    // Other delimiter, other headers: the old mapping no longer fits, so the supplier's remembered one (or the guess) is used.
    const remembered = newDelimiter ? await supplierMapping(ds, list.supplier_id) : null;
    await stageList(deps, {
      listId: input.id,
      supplierId: list.supplier_id,
      open: () => readFileChunks(ds, input.id),
      sizeBytes: list.size_bytes,
      mapping: newDelimiter ? undefined : input.mapping,
      rememberedMapping: remembered ?? undefined,
      delimiter: input.delimiter ?? (isDelimiter(list.delimiter) ? list.delimiter : undefined),
      // A stored file was under the limit when it came; a lower limit since then does not refuse it.
      maxFileBytes: Math.max(maxFileBytes, list.size_bytes),
      flagThresholdPct,
    });
  } else {
    await compareAgain(deps, input.id, list, flagThresholdPct);
  }
  return getPriceList(ds, input.id);
}

/** POST /api/price-lists/:id/discard: the catalog is not touched; the staged rows and the kept file go. */
export async function discardPriceList(ds: DataSource, listId: string, actorId: string | null): Promise<PriceListRow> {
  await ds.transaction(async (m) => {
    await lockListOrRefuse(m, listId);
    const list = await stagedFacts(m, listId, true);
    if (!list) throw AppError.notFound('Price list');
    if (list.status !== 'staged') throw AppError.conflict(`This price list is ${list.status}; only a staged list can be discarded.`);
    await markDiscarded(m, listId, actorId);
    await deleteStagedRows(m, listId, { errors: false });
    await deleteFileChunks(m, listId);
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
