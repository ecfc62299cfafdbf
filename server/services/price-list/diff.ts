import type { ResolvedMapping } from '../../../shared/price-list/mapping';
import type { PriceListCounts } from '../../../shared/schemas/price-lists';
import type { Executor } from '../../db/executor';
import {
  allowNestedLoops,
  checkSupersessions,
  classifyRows,
  deleteCatalogRejections,
  diffCounts,
  markSupersessionLoops,
  recordCatalogRejections,
} from '../../repositories/price-list-diff.repository';

/**
 * The comparison of a staged list with the catalog (the statements are in
 * repositories/price-list-diff.repository.ts). Runs in the staging transaction, under the
 * supplier's lock, so the old prices it reads are those the next commit will replace.
 */

export interface DiffResult {
  counts: PriceListCounts;
  flagged: number;
}

/** The header each field was read from, for the column of a catalog rejection. */
export function fieldHeaders(resolved: ResolvedMapping): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [field, index] of Object.entries(resolved.columns)) {
    if (index !== undefined) out[field] = resolved.headers[index] || `column ${index + 1}`;
  }
  return out;
}

/**
 * Compares the staged rows of a list with the catalog, replacing any earlier comparison.
 * `dataLines` is the file's count of data lines, which every line is one of.
 */
export async function diffStagedList(
  ex: Executor,
  opts: { listId: string; supplierId: string; flagThresholdPct: number; headers: Record<string, string>; dataLines: number },
): Promise<DiffResult> {
  const { listId } = opts;
  await deleteCatalogRejections(ex, listId);
  await allowNestedLoops(ex, false);
  await classifyRows(ex, listId, opts.supplierId, opts.flagThresholdPct);
  await recordCatalogRejections(ex, listId, opts.headers);
  await checkSupersessions(ex, listId);
  // The walk up supersession chains is a handful of index lookups per link: loops are right there.
  await allowNestedLoops(ex, true);
  await markSupersessionLoops(ex, listId);
  const row = await diffCounts(ex, listId);
  const counts: PriceListCounts = {
    total: opts.dataLines,
    new: row.new,
    changed: row.changed,
    unchanged: row.unchanged,
    rejected: row.rejected,
    firstPrices: row.first_prices,
    supersessions: row.supersessions,
  };
  const sum = counts.new + counts.changed + counts.unchanged + counts.rejected;
  // Every data line is exactly one of these; anything else is a defect here, not bad input.
  if (sum !== counts.total) throw new Error(`price-list ${listId}: ${sum} lines classified, the file has ${counts.total}`);
  return { counts, flagged: row.flagged };
}
