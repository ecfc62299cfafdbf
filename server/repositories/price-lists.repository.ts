import { z } from 'zod';
import { PRICE_LIST_FIELDS } from '../../shared/price-list/fields';
import type { Mapping } from '../../shared/price-list/mapping';
import {
  PRICE_LIST_STATUSES,
  priceListAppliedSchema,
  priceListCountsSchema,
  priceListProgressSchema,
  type PriceListApplied,
  type PriceListCounts,
  type PriceListHistoryQuery,
  type PriceListProgress,
} from '../../shared/schemas/price-lists';
import { execute, queryCount, queryExists, queryOne, queryRows, type Executor } from '../db/executor';

/** A mapping as stored: the file's own headers as keys, whatever their length (the intake checked the rest). */
export const storedMappingSchema = z.record(z.string(), z.enum(PRICE_LIST_FIELDS).nullable());

/** A price_list row with its supplier's name and its people's names joined. */
const priceListRowSchema = z.object({
  id: z.string(),
  supplier_id: z.string(),
  supplier_name: z.string(),
  file_name: z.string(),
  sha256: z.string(),
  /** bigint: pg hands it over as text. */
  size_bytes: z.coerce.number().int(),
  encoding: z.string().nullable(),
  delimiter: z.string().nullable(),
  columns: z.array(z.string()),
  mapping: storedMappingSchema,
  mapping_source: z.enum(['given', 'remembered', 'guessed']),
  status: z.enum(PRICE_LIST_STATUSES),
  stale: z.boolean(),
  counts: priceListCountsSchema.nullable(),
  flagged: z.number().int(),
  flag_threshold_pct: z.number().nullable(),
  progress: priceListProgressSchema.partial(),
  applied: priceListAppliedSchema.nullable(),
  created_by: z.string().nullable(),
  created_by_name: z.string().nullable(),
  created_at: z.date(),
  committed_by: z.string().nullable(),
  committed_by_name: z.string().nullable(),
  committed_at: z.date().nullable(),
  discarded_at: z.date().nullable(),
});
export type PriceListRow = z.infer<typeof priceListRowSchema>;

const PRICE_LIST_SELECT = `
SELECT pl.id, pl.supplier_id, s.name AS supplier_name, pl.file_name, pl.sha256, pl.size_bytes, pl.encoding, pl.delimiter,
       pl.columns, pl.mapping, pl.mapping_source, pl.status, pl.stale, pl.counts, pl.flagged, pl.flag_threshold_pct,
       pl.progress, pl.applied, pl.created_by, cu.name AS created_by_name, pl.created_at,
       pl.committed_by, mu.name AS committed_by_name, pl.committed_at, pl.discarded_at
  FROM price_list pl
  JOIN supplier s ON s.id = pl.supplier_id
  LEFT JOIN "user" cu ON cu.id = pl.created_by
  LEFT JOIN "user" mu ON mu.id = pl.committed_by`;

export function findPriceList(ex: Executor, id: string): Promise<PriceListRow | null> {
  return queryOne(ex, priceListRowSchema, `${PRICE_LIST_SELECT} WHERE pl.id = $1`, [id]);
}

export function priceListExists(ex: Executor, id: string): Promise<boolean> {
  return queryExists(ex, `SELECT 1 FROM price_list WHERE id = $1`, [id]);
}

/** The history: newest first, of one supplier or of all, with the count of all. */
export async function listPriceListRows(ex: Executor, q: PriceListHistoryQuery): Promise<{ rows: PriceListRow[]; total: number }> {
  const where = q.supplierId ? `WHERE pl.supplier_id = $1` : '';
  const params = q.supplierId ? [q.supplierId] : [];
  // limit and offset are integers checked by the query schema.
  const rows = await queryRows(
    ex,
    priceListRowSchema,
    `${PRICE_LIST_SELECT} ${where} ORDER BY pl.created_at DESC, pl.id LIMIT ${q.limit} OFFSET ${q.offset}`,
    params,
  );
  return { rows, total: await queryCount(ex, `SELECT count(*)::int AS n FROM price_list pl ${where}`, params) };
}

// ---------- locks ----------

const lockRowSchema = z.object({ ok: z.boolean() });

/** The list's own lock for the transaction, if nobody holds it; its own key space, apart from the suppliers'. */
export async function tryLockList(ex: Executor, listId: string): Promise<boolean> {
  return (await queryOne(ex, lockRowSchema, `SELECT pg_try_advisory_xact_lock(2, hashtext($1)) AS ok`, [listId]))?.ok ?? false;
}

/** The supplier's lock for the transaction, waiting for it. */
export async function lockSupplier(ex: Executor, supplierId: string): Promise<void> {
  await execute(ex, `SELECT pg_advisory_xact_lock(hashtext($1))`, [supplierId]);
}

// ---------- intake ----------

const committedFileRowSchema = z.object({ id: z.string(), committed_at: z.date(), file_name: z.string() });
export type CommittedFileRow = z.infer<typeof committedFileRowSchema>;

/** The supplier's committed list of the file with this SHA-256, other than `exceptId`. */
export function committedListOfFile(ex: Executor, supplierId: string, sha256: string, exceptId?: string): Promise<CommittedFileRow | null> {
  return queryOne(
    ex,
    committedFileRowSchema,
    `SELECT id, committed_at, file_name FROM price_list
      WHERE supplier_id = $1 AND sha256 = $2 AND status = 'committed' AND ($3::uuid IS NULL OR id <> $3)`,
    [supplierId, sha256, exceptId ?? null],
  );
}

/** A list still "processing" with no progress for this long belongs to a server that died: it is marked failed. */
export async function failAbandonedLists(ex: Executor, idleFor: string): Promise<void> {
  await execute(ex, `UPDATE price_list SET status = 'failed' WHERE status = 'processing' AND updated_at < now() - $1::interval`, [idleFor]);
}

export interface NewPriceList {
  id: string;
  supplierId: string;
  fileName: string;
  sha256: string;
  sizeBytes: number;
  progress: PriceListProgress;
  createdBy: string | null;
}

export async function insertProcessingList(ex: Executor, l: NewPriceList): Promise<void> {
  await execute(
    ex,
    `INSERT INTO price_list (id, supplier_id, file_name, sha256, size_bytes, status, progress, created_by)
     VALUES ($1, $2, $3, $4, $5, 'processing', $6, $7)`,
    [l.id, l.supplierId, l.fileName, l.sha256, l.sizeBytes, JSON.stringify(l.progress), l.createdBy],
  );
}

/** A first upload that failed: its row goes, unless it was staged meanwhile. */
export async function deleteProcessingList(ex: Executor, id: string): Promise<void> {
  await execute(ex, `DELETE FROM price_list WHERE id = $1 AND status = 'processing'`, [id]);
}

export async function setProgress(ex: Executor, id: string, progress: PriceListProgress): Promise<void> {
  await execute(ex, `UPDATE price_list SET progress = $2, updated_at = now() WHERE id = $1`, [id, JSON.stringify(progress)]);
}

export interface Staging {
  encoding: string;
  delimiter: string;
  columns: string[];
  mapping: Mapping;
  mappingSource: 'given' | 'remembered' | 'guessed';
  dataLines: number;
  counts: PriceListCounts;
  flagged: number;
  flagThresholdPct: number;
  progress: PriceListProgress;
}

/** The list read and compared; false when it was committed or discarded meanwhile. */
export async function markStaged(ex: Executor, id: string, s: Staging): Promise<boolean> {
  const updated = await execute(
    ex,
    `UPDATE price_list SET status = 'staged', stale = false, encoding = $2, delimiter = $3, columns = $4, mapping = $5,
            mapping_source = $6, data_lines = $7, counts = $8, flagged = $9, flag_threshold_pct = $10, progress = $11, updated_at = now()
      WHERE id = $1 AND status IN ('processing', 'staged')`,
    [
      id,
      s.encoding,
      s.delimiter,
      JSON.stringify(s.columns),
      JSON.stringify(s.mapping),
      s.mappingSource,
      s.dataLines,
      JSON.stringify(s.counts),
      s.flagged,
      s.flagThresholdPct,
      JSON.stringify(s.progress),
    ],
  );
  return updated === 1;
}

/** A staged list compared again; false when it was committed or discarded meanwhile. */
export async function markCompared(
  ex: Executor,
  id: string,
  c: { counts: PriceListCounts; flagged: number; flagThresholdPct: number },
): Promise<boolean> {
  const updated = await execute(
    ex,
    `UPDATE price_list SET stale = false, counts = $2, flagged = $3, flag_threshold_pct = $4, updated_at = now()
      WHERE id = $1 AND status = 'staged'`,
    [id, JSON.stringify(c.counts), c.flagged, c.flagThresholdPct],
  );
  return updated === 1;
}

const stagedFactsSchema = z.object({
  supplier_id: z.string(),
  status: z.enum(PRICE_LIST_STATUSES),
  columns: z.array(z.string()),
  mapping: storedMappingSchema,
  size_bytes: z.coerce.number().int(),
  data_lines: z.number().int().nullable(),
  file_name: z.string(),
  delimiter: z.string().nullable(),
});
export type StagedFacts = z.infer<typeof stagedFactsSchema>;

/** What previewing again, discarding and the errors download need of a list. `forUpdate` locks its row. */
export function stagedFacts(ex: Executor, id: string, forUpdate = false): Promise<StagedFacts | null> {
  return queryOne(
    ex,
    stagedFactsSchema,
    `SELECT supplier_id, status, columns, mapping, size_bytes, data_lines, file_name, delimiter FROM price_list WHERE id = $1${forUpdate ? ' FOR UPDATE' : ''}`,
    [id],
  );
}

export async function markDiscarded(ex: Executor, id: string, actorId: string | null): Promise<void> {
  await execute(
    ex,
    `UPDATE price_list SET status = 'discarded', discarded_by = $2, discarded_at = now(), updated_at = now() WHERE id = $1`,
    [id, actorId],
  );
}

// ---------- commit ----------

const commitFactsSchema = z.object({
  supplier_id: z.string(),
  status: z.enum(PRICE_LIST_STATUSES),
  stale: z.boolean(),
  sha256: z.string(),
  mapping: storedMappingSchema,
  counts: priceListCountsSchema.nullable(),
  file_name: z.string(),
});
export type CommitFacts = z.infer<typeof commitFactsSchema>;

const supplierIdRowSchema = z.object({ supplier_id: z.string() });

export async function supplierOfList(ex: Executor, id: string): Promise<string | null> {
  return (await queryOne(ex, supplierIdRowSchema, `SELECT supplier_id FROM price_list WHERE id = $1`, [id]))?.supplier_id ?? null;
}

/** The list as the commit reads it, its row locked. */
export function commitFacts(ex: Executor, id: string): Promise<CommitFacts | null> {
  return queryOne(
    ex,
    commitFactsSchema,
    `SELECT supplier_id, status, stale, sha256, mapping, counts, file_name FROM price_list WHERE id = $1 FOR UPDATE`,
    [id],
  );
}

/** Marks the list committed, remembers its mapping for the supplier, and marks the supplier's other open lists stale. */
export async function markCommitted(
  ex: Executor,
  c: { listId: string; supplierId: string; actorId: string | null; applied: PriceListApplied; mapping: Mapping },
): Promise<void> {
  await execute(
    ex,
    `UPDATE price_list SET status = 'committed', stale = false, committed_by = $2, committed_at = now(), applied = $3, updated_at = now()
      WHERE id = $1`,
    [c.listId, c.actorId, JSON.stringify(c.applied)],
  );
  await execute(ex, `UPDATE supplier SET mapping = $2 WHERE id = $1`, [c.supplierId, JSON.stringify(c.mapping)]);
  await execute(
    ex,
    `UPDATE price_list SET stale = true, updated_at = now() WHERE supplier_id = $1 AND id <> $2 AND status IN ('staged', 'processing')`,
    [c.supplierId, c.listId],
  );
}

const summaryFactsSchema = z.object({
  counts: priceListCountsSchema,
  applied: priceListAppliedSchema,
  supplier_name: z.string(),
  file_name: z.string(),
  sha256: z.string(),
  committed_by_name: z.string().nullable(),
  flagged: z.number().int(),
  flag_threshold_pct: z.number().nullable(),
});
export type SummaryFacts = z.infer<typeof summaryFactsSchema>;

/** What the buyers' summary e-mail tells of a committed list; null when it is not committed. */
export function committedSummary(ex: Executor, id: string): Promise<SummaryFacts | null> {
  return queryOne(
    ex,
    summaryFactsSchema,
    `SELECT pl.counts, pl.applied, s.name AS supplier_name, pl.file_name, pl.sha256, u.name AS committed_by_name, pl.flagged,
            pl.flag_threshold_pct
       FROM price_list pl JOIN supplier s ON s.id = pl.supplier_id LEFT JOIN "user" u ON u.id = pl.committed_by
      WHERE pl.id = $1 AND pl.status = 'committed'`,
    [id],
  );
}
