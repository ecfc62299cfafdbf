import type { Executor } from '../../db/executor';
import { AppError } from '../../errors';
import { lockSupplier, tryLockList } from '../../repositories/price-lists.repository';

export { lockSupplier };

/**
 * Lock order, everywhere: the list's own lock first, then the supplier's. The list lock keeps a
 * preview, a commit and a discard of one list apart; the supplier lock serialises commits (and
 * comparisons) for one supplier, so no commit reads prices another is replacing.
 */
export async function lockListOrRefuse(ex: Executor, listId: string): Promise<void> {
  if (!(await tryLockList(ex, listId)))
    throw AppError.conflict('This price list is being processed by another request; try again in a moment.');
}
