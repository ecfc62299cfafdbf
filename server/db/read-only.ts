import { setTimeout as sleep } from 'node:timers/promises';
import type { DataSource, EntityManager } from 'typeorm';
import { z } from 'zod';
import { queryOne } from './executor';

/** How long a read that must see the latest writes waits for a replica before the primary answers it. */
const CATCH_UP_WAIT_MS = 2_000;
const CATCH_UP_POLL_MS = 50;

/**
 * Read-only work on a replica when DATABASE_REPLICA_URLS names any (TypeORM picks one at random),
 * else on the one database. Every query of `work` runs on that one connection, so the reads of one
 * answer come from one server. Only for reads that may lag the primary by the replica's delay: a
 * read after a write in the same request stays on the primary (`ds.manager`).
 */
export async function readOnly<T>(ds: DataSource, work: (ex: EntityManager) => Promise<T>): Promise<T> {
  if (!ds.driver.isReplicated) return work(ds.manager);
  const runner = ds.createQueryRunner('slave');
  try {
    return await work(runner.manager);
  } finally {
    await runner.release();
  }
}

const lsnRow = z.object({ lsn: z.string() });
const caughtUpRow = z.object({ ok: z.boolean() });

/**
 * Read-only work that must see every write committed before it began — a job that follows a
 * write, such as the search index refresh after a catalog edit. It goes to a replica once the
 * replica has replayed the primary's WAL up to where it stood at the start, and to the primary
 * when the replica stays behind longer than a moment.
 */
export async function readCaughtUp<T>(ds: DataSource, work: (ex: EntityManager) => Promise<T>): Promise<T> {
  if (!ds.driver.isReplicated) return work(ds.manager);
  const primary = await queryOne(ds.manager, lsnRow, `SELECT pg_current_wal_insert_lsn()::text AS lsn`);
  if (!primary) throw new Error('the primary did not give its WAL position');
  const runner = ds.createQueryRunner('slave');
  try {
    const deadline = Date.now() + CATCH_UP_WAIT_MS;
    for (;;) {
      // A server not in recovery is a primary itself: it has every write.
      const replayed = await queryOne(
        runner.manager,
        caughtUpRow,
        `SELECT (NOT pg_is_in_recovery() OR coalesce(pg_last_wal_replay_lsn() >= $1::pg_lsn, false)) AS ok`,
        [primary.lsn],
      );
      if (replayed?.ok) return await work(runner.manager);
      if (Date.now() >= deadline) break;
      await sleep(CATCH_UP_POLL_MS);
    }
  } finally {
    await runner.release();
  }
  return work(ds.manager);
}
