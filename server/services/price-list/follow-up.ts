import type { EntityManager } from 'typeorm';
import type { JobQueue } from '../../jobs/queue';
import { touchedOwnPartIds } from '../../repositories/price-list-rows.repository';

/** Above this many touched parts one rebuild is cheaper than refreshing them in pieces. */
const REBUILD_ABOVE = 5000;

/**
 * What follows a commit, queued in its transaction so that the jobs exist exactly when the
 * commit does: the search index for the parts it touched (PostgreSQL stays the truth) and the
 * summary e-mail to the buyers. Their failures are retried by the queue, never reported as the
 * commit's.
 */
export async function enqueueCommitFollowUp(m: EntityManager, jobs: JobQueue, listId: string): Promise<void> {
  // Read inside the commit's transaction, and no more than it takes to choose refresh or rebuild.
  const ids = await touchedOwnPartIds(m, listId, REBUILD_ABOVE + 1);
  if (ids.length > REBUILD_ABOVE) await jobs.enqueue(m, 'search.rebuild', { reason: `after price list ${listId}` });
  else if (ids.length > 0) await jobs.enqueue(m, 'search.refresh', { partIds: ids });
  await jobs.enqueue(m, 'mail.send', { kind: 'price-list-summary', priceListId: listId });
}
