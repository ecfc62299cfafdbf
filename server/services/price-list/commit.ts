import type { DataSource, EntityManager } from 'typeorm';
import type { JobQueue } from '../../jobs/queue';
import type { PriceListApplied, PriceListCounts } from '../../../shared/schemas/price-lists';
import type { CounterPrices } from '../../../shared/schemas/sell-price';
import { formatDate } from '../../../shared/format';
import { AppError } from '../../errors';
import { audit } from '../../repositories/audit.repository';
import { allowNestedLoops } from '../../repositories/price-list-diff.repository';
import {
  countSupersessionLoops,
  insertNewPartsAndPrices,
  insertNewSpecs,
  insertOtherPrices,
  linkSupersessions,
  updateKnownPrices,
} from '../../repositories/price-list-commit.repository';
import { deleteFileChunks } from '../../repositories/price-list-files.repository';
import { counterPricesOfList } from '../../repositories/prices.repository';
import {
  commitFacts,
  committedListOfFile,
  markCommitted,
  supplierOfList,
  type CommitFacts,
  type PriceListRow,
} from '../../repositories/price-lists.repository';
import { enqueueCommitFollowUp } from './follow-up';
import { lockListOrRefuse, lockSupplier } from './locks';
import { getPriceList } from './queries';

/**
 * The commit: every valid row of a staged list in one transaction, set-based — new parts (with
 * their spec when the file gave a whole one), the supplier's prices, the supersession links —
 * then the list marked committed, the mapping remembered, the supplier's other staged lists
 * marked stale, and the audit row. Any failure, or the process dying, leaves none of it.
 */

async function loadForCommit(m: EntityManager, listId: string): Promise<CommitFacts> {
  const list = await commitFacts(m, listId);
  if (!list) throw AppError.notFound('Price list');
  return list;
}

async function refuseUnlessCommittable(m: EntityManager, listId: string, list: CommitFacts): Promise<PriceListCounts> {
  if (list.status === 'committed') throw AppError.conflict('This price list is committed already.');
  if (list.status !== 'staged' || list.counts === null) {
    throw AppError.conflict(`This price list is ${list.status}; only a staged list can be committed.`);
  }
  const same = await committedListOfFile(m, list.supplier_id, list.sha256, listId);
  if (same) {
    throw AppError.conflict(`This same file was committed for this supplier on ${formatDate(same.committed_at)}.`, {
      priceListId: same.id,
    });
  }
  if (list.stale) {
    throw AppError.conflict('Another price list of this supplier was committed since this preview: preview it again before committing.', {
      stale: true,
    });
  }
  return list.counts;
}

export interface CommitOutcome {
  supplierId: string;
  counts: PriceListCounts;
  applied: PriceListApplied;
}

/** `followUp` runs last inside the transaction: the caller queues there what must exist exactly when the commit does. */
export async function commitPriceList(
  ds: DataSource,
  listId: string,
  actorId: string | null,
  followUp?: (m: EntityManager) => Promise<void>,
): Promise<CommitOutcome> {
  return ds.transaction(async (m) => {
    await lockListOrRefuse(m, listId);
    const peek = await supplierOfList(m, listId);
    if (!peek) throw AppError.notFound('Price list');
    // Serialises commits for one supplier; the list is read again under the lock, as the last commit left it.
    await lockSupplier(m, peek);
    const list = await loadForCommit(m, listId);
    const counts = await refuseUnlessCommittable(m, listId, list);
    const supplierId = list.supplier_id;
    // As in the diff (see diff.ts): prices written moments ago in this transaction have no
    // statistics, and a nested loop over them is quadratic. Hash joins stay linear.
    await allowNestedLoops(m, false);

    const created = await insertNewPartsAndPrices(m, listId, supplierId);
    const partsCreated = created.parts;
    const specsStored = await insertNewSpecs(m, listId);
    const pricesWritten =
      created.prices +
      (await updateKnownPrices(m, listId, supplierId)) +
      (await insertOtherPrices(m, listId, supplierId, partsCreated < counts.new));
    const accepted = counts.new + counts.changed + counts.unchanged;
    if (pricesWritten !== accepted) {
      // Only a change to this supplier's prices outside price lists can do this; the preview no longer holds.
      throw AppError.conflict(`The catalog changed since the preview (${pricesWritten} of ${accepted} prices matched): preview again.`);
    }
    await allowNestedLoops(m, true);
    const supersessionsLinked = await linkSupersessions(m, listId);
    if ((await countSupersessionLoops(m, listId)) > 0) {
      throw AppError.conflict(
        'A supersession in this file would now make a loop with a catalog edit made since the preview: preview again.',
      );
    }

    const applied: PriceListApplied = { partsCreated, specsStored, pricesWritten, supersessionsLinked };
    await markCommitted(m, { listId, supplierId, actorId, applied, mapping: list.mapping });
    await deleteFileChunks(m, listId);
    await audit(m, {
      actorId,
      action: 'price-list.commit',
      entityType: 'price_list',
      entityId: listId,
      data: { supplierId, fileName: list.file_name, sha256: list.sha256, counts, applied },
    });
    if (followUp) await followUp(m);
    return { supplierId, counts, applied };
  });
}

/**
 * POST /api/price-lists/:id/commit: the search index and the buyers' e-mail are queued inside the
 * commit, so nothing after it can fail the request; answers the list as committed.
 */
export async function commitWithFollowUp(
  ds: DataSource,
  jobs: JobQueue,
  listId: string,
  actorId: string | null,
): Promise<{ list: PriceListRow; counterPrices: CounterPrices }> {
  const { supplierId } = await commitPriceList(ds, listId, actorId, (m) => enqueueCommitFollowUp(m, jobs, listId));
  // Read after the commit, by the same rule the Counter reads prices with: what the commit's message says is what the Counter shows.
  const counterPrices = await counterPricesOfList(ds.manager, listId, supplierId);
  return { list: await getPriceList(ds, listId), counterPrices };
}
