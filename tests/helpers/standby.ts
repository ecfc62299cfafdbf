import { execFile } from 'node:child_process';
import { mkdtemp } from 'node:fs/promises';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import pg from 'pg';
import { vi } from 'vitest';
import { z } from 'zod';
import { queryOne } from '../../server/db/executor';

const SCRIPT = fileURLToPath(new URL('../../server/scripts/standby.sh', import.meta.url));
/** Ports from here up are the standby's (the project's clusters sit below). */
const FIRST_PORT = 54346;

const run = promisify(execFile);

function portIsFree(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const probe = createServer();
    probe.once('error', () => resolve(false));
    probe.listen(port, '127.0.0.1', () => probe.close(() => resolve(true)));
  });
}

async function freePort(): Promise<number> {
  for (let port = FIRST_PORT; port < FIRST_PORT + 50; port++) if (await portIsFree(port)) return port;
  throw new Error(`no free port from ${FIRST_PORT}`);
}

async function one<S extends z.ZodType>(client: pg.Client, schema: S, sql: string, params: unknown[] = []): Promise<z.output<S>> {
  const row = await queryOne(client, schema, sql, params);
  if (row === null) throw new Error(`no row from ${sql}`);
  return row;
}

/**
 * A real streaming standby of the test database's cluster, on its own port and socket folder:
 * `pg_basebackup -R` from the primary, started as a hot standby (server/scripts/standby.sh).
 * `primary` and `standby` are direct connections to each server, for the test's own checks.
 */
export class Standby {
  private constructor(
    readonly url: string,
    readonly port: number,
    private readonly dir: string,
    readonly primary: pg.Client,
    readonly standby: pg.Client,
  ) {}

  static async start(primaryUrl: string): Promise<Standby> {
    const port = await freePort();
    const dir = await mkdtemp(path.join(tmpdir(), 'arcwise-standby-'));
    await run('bash', [SCRIPT, 'start', primaryUrl, String(port), dir], { timeout: 120_000 });
    const url = new URL(primaryUrl);
    url.port = String(port);
    const primary = new pg.Client({ connectionString: primaryUrl });
    const standby = new pg.Client({ connectionString: url.toString() });
    await primary.connect();
    await standby.connect();
    return new Standby(url.toString(), port, dir, primary, standby);
  }

  /** Waits until the standby has replayed everything the primary had written when called. */
  async catchUp(): Promise<void> {
    const { lsn } = await one(this.primary, z.object({ lsn: z.string() }), `SELECT pg_current_wal_lsn()::text AS lsn`);
    await vi.waitFor(
      async () => {
        const { ok } = await one(
          this.standby,
          z.object({ ok: z.boolean() }),
          `SELECT coalesce(pg_last_wal_replay_lsn() >= $1::pg_lsn, false) AS ok`,
          [lsn],
        );
        if (!ok) throw new Error(`standby behind ${lsn}`);
      },
      { timeout: 30_000, interval: 50 },
    );
  }

  /** Stops applying the WAL it receives: the standby shows the database as it was until resumeReplay(). */
  async pauseReplay(): Promise<void> {
    await this.standby.query(`SELECT pg_wal_replay_pause()`);
    await vi.waitFor(
      async () => {
        const { state } = await one(this.standby, z.object({ state: z.string() }), `SELECT pg_get_wal_replay_pause_state() AS state`);
        if (state !== 'paused') throw new Error(`replay ${state}`);
      },
      { timeout: 10_000, interval: 20 },
    );
  }

  async resumeReplay(): Promise<void> {
    await this.standby.query(`SELECT pg_wal_replay_resume()`);
  }

  async stop(): Promise<void> {
    await Promise.allSettled([this.primary.end(), this.standby.end()]);
    await run('bash', [SCRIPT, 'stop', this.dir], { timeout: 60_000 });
  }
}
