import type { DataSource } from 'typeorm';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Open PostgreSQL connections of a process, by the application_name it gave them (PGAPPNAME). */
export async function backends(ds: DataSource, appName: string): Promise<number> {
  const rows = (await ds.query(`SELECT count(*)::int AS n FROM pg_stat_activity WHERE application_name = $1`, [appName])) as {
    n: number;
  }[];
  return rows[0]?.n ?? 0;
}

/** PostgreSQL ends a dead client's transaction only when it next talks to it: wait for that. */
export async function waitForBackendsGone(ds: DataSource, appName: string): Promise<void> {
  const deadline = Date.now() + 30_000;
  while ((await backends(ds, appName)) > 0) {
    if (Date.now() > deadline) throw new Error(`connections of ${appName} still open`);
    await sleep(25);
  }
}
