import type { EntityManager } from 'typeorm';
import type { JobQueue } from '../../jobs/queue';

/** Above this many touched parts one rebuild is cheaper than refreshing them in pieces. */
const REBUILD_ABOVE = 5000;

/**
 * Parts whose search documents a commit changed: the new ones and both ends of each link, of
 * our own brands (the only ones the Counter's index holds). Prices are not in the documents.
 * Read inside the commit's transaction, and no more than it takes to choose refresh or rebuild.
 */
async function touchedPartIds(m: EntityManager, listId: string): Promise<string[]> {
  const rows = (await m.query(
    `SELECT p.id FROM price_list_row r JOIN brand b ON b.id = r.brand_id AND b.ours
       JOIN part p ON p.brand_id = r.brand_id AND p.part_number_norm = r.part_number_norm
      WHERE r.price_list_id = $1 AND (r.change = 'new' OR r.supersession = 'link')
     UNION
     SELECT old.id FROM price_list_row r JOIN brand b ON b.id = r.brand_id AND b.ours
       JOIN part old ON old.brand_id = r.brand_id AND old.part_number_norm = r.supersedes_norm
      WHERE r.price_list_id = $1 AND r.supersession = 'link'
     LIMIT $2`,
    [listId, REBUILD_ABOVE + 1],
  )) as { id: string }[];
  return rows.map((r) => r.id);
}

/**
 * What follows a commit, queued in its transaction so that the jobs exist exactly when the
 * commit does: the search index for the parts it touched (PostgreSQL stays the truth) and the
 * summary e-mail to the buyers. Their failures are retried by the queue, never reported as the
 * commit's.
 */
export async function enqueueCommitFollowUp(m: EntityManager, jobs: JobQueue, listId: string): Promise<void> {
  const ids = await touchedPartIds(m, listId);
  if (ids.length > REBUILD_ABOVE) await jobs.enqueue(m, 'search.rebuild', { reason: `after price list ${listId}` });
  else if (ids.length > 0) await jobs.enqueue(m, 'search.refresh', { partIds: ids });
  await jobs.enqueue(m, 'mail.send', { kind: 'price-list-summary', priceListId: listId });
}
