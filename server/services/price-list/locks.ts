import { AppError } from '../../errors';

/** Anything that runs SQL: a pg client or a TypeORM manager. */
export interface Queryable {
  query(sql: string, params?: unknown[]): Promise<unknown>;
}

/**
 * Lock order, everywhere: the list's own lock first, then the supplier's. The list lock keeps a
 * preview, a commit and a discard of one list apart; the supplier lock serialises commits (and
 * comparisons) for one supplier, so no commit reads prices another is replacing.
 */
export async function lockListOrRefuse(q: Queryable, listId: string): Promise<void> {
  // Two-key form: its own key space, apart from the one-key supplier locks.
  const rows = (await q.query(`SELECT pg_try_advisory_xact_lock(2, hashtext($1)) AS ok`, [listId])) as
    { ok: boolean }[] | { rows: { ok: boolean }[] };
  const ok = Array.isArray(rows) ? rows[0]?.ok : rows.rows[0]?.ok;
  if (!ok) throw AppError.conflict('This price list is being processed by another request; try again in a moment.');
}

export async function lockSupplier(q: Queryable, supplierId: string): Promise<void> {
  await q.query(`SELECT pg_advisory_xact_lock(hashtext($1))`, [supplierId]);
}
