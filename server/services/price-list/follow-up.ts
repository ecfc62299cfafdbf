import { appUrl } from '../../config/env';
import type { AppDeps } from '../../deps';
import type { CommitOutcome } from './commit';
import { buyerEmails, summaryMail } from './summary-mail';

/** Above this many touched parts one rebuild is cheaper than refreshing them in pieces. */
const REBUILD_ABOVE = 5000;

/**
 * Parts whose search documents a commit changed: the new ones and both ends of each link, of
 * our own brands (the only ones the Counter's index holds). Prices are not in the documents.
 */
async function touchedPartIds(deps: AppDeps, listId: string): Promise<string[]> {
  const rows = (await deps.dataSource.query(
    `SELECT p.id FROM price_list_row r JOIN brand b ON b.id = r.brand_id AND b.ours
       JOIN part p ON p.brand_id = r.brand_id AND p.part_number_norm = r.part_number_norm
      WHERE r.price_list_id = $1 AND (r.change = 'new' OR r.supersession = 'link')
     UNION
     SELECT old.id FROM price_list_row r JOIN brand b ON b.id = r.brand_id AND b.ours
       JOIN part old ON old.brand_id = r.brand_id AND old.part_number_norm = r.supersedes_norm
      WHERE r.price_list_id = $1 AND r.supersession = 'link'`,
    [listId],
  )) as { id: string }[];
  return rows.map((r) => r.id);
}

/**
 * What follows a commit outside its transaction: the search index (PostgreSQL stays the truth;
 * a failure here is reported, not undone) and the summary e-mail to the buyers.
 */
export async function followCommit(deps: AppDeps, listId: string, outcome: CommitOutcome): Promise<string[]> {
  const notices: string[] = [];
  try {
    const ids = await touchedPartIds(deps, listId);
    if (ids.length > REBUILD_ABOVE) await deps.search.rebuild(deps.dataSource);
    else await deps.search.refresh(deps.dataSource, ids);
  } catch (err) {
    console.error('[arcwise] search index refresh after a price-list commit failed:', err);
    notices.push('The search index could not be updated; it catches up at the next restart.');
  }
  try {
    const to = await buyerEmails(deps.dataSource);
    if (to.length > 0) {
      const link = `${appUrl(deps.env)}/price-lists/${listId}`;
      await deps.mailer.send({ to, ...(await summaryMail(deps.dataSource, listId, outcome.counts, outcome.applied, link)) });
    }
  } catch (err) {
    console.error('[arcwise] price-list summary e-mail failed:', err);
    notices.push('The summary e-mail could not be sent.');
  }
  return notices;
}
