import pg from 'pg';
import PgBoss from 'pg-boss';
import type { EntityManager } from 'typeorm';
import { JOB_NAMES, type JobName } from '../../shared/schemas/jobs';
import { JOBS, type JobPayload } from './index';
import type { Logger } from '../observability/logger';
import type { JobDefinition, JobDeps } from './job';
import { listenForNewJobs, WAKE_CHANNEL, type JobWakeListener } from './wake';

/** pg-boss's own schema in the app's database; it creates and migrates it on start. */
export const JOB_SCHEMA = 'pgboss';
/** A job out of attempts stays in the job table (listed on the Jobs page, retryable) this long. */
const KEEP_FAILED_SECONDS = 30 * 24 * 3600;

/**
 * pg-boss's own errors (a lost connection, a failed maintenance run): it carries on, so they are
 * logged — by message, as pg's errors carry the whole client object along.
 */
const logTo =
  (logger: Pick<Logger, 'error'>) =>
  (err: Error): void =>
    logger.error({ error: err.message }, 'job queue error');

function bossOptions(databaseUrl: string, supervise: boolean): PgBoss.ConstructorOptions {
  return {
    connectionString: databaseUrl,
    schema: JOB_SCHEMA,
    application_name: 'arcwise-jobs',
    max: 3,
    // No cron jobs; maintenance (expiring stuck attempts, archiving) where workers run.
    schedule: false,
    supervise,
    archiveFailedAfterSeconds: KEEP_FAILED_SECONDS,
  };
}

/** pg-boss wants each queue created before a job is sent to it; creating one again changes nothing. */
async function createQueues(boss: PgBoss): Promise<void> {
  for (const name of JOB_NAMES) await boss.createQueue(name, { name, policy: JOBS[name].policy });
}

/** Creates (or migrates) the queue's schema and queues ahead of several processes starting at once. */
export async function installJobQueue(databaseUrl: string): Promise<void> {
  const boss = new PgBoss(bossOptions(databaseUrl, false));
  boss.on('error', (err) => console.error('[arcwise] job queue:', err.message));
  await boss.start();
  await createQueues(boss);
  await boss.stop({ graceful: false });
}

/**
 * The follow-up work after a commit, in PostgreSQL through pg-boss. A write enqueues its jobs in
 * its own transaction, so a job exists exactly when the write committed; workers run them after,
 * retrying with exponential backoff, and a job out of attempts stays failed for the Jobs page.
 * Every process enqueues; workers run where JOB_WORKERS is on (startWorkers).
 */
export class JobQueue {
  private readonly boss: PgBoss;
  private readonly workerIds = new Map<string, string>();
  private wake: JobWakeListener | null = null;

  constructor(private readonly deps: JobDeps) {
    this.boss = new PgBoss(bossOptions(deps.env.DATABASE_URL, deps.env.JOB_WORKERS));
    this.boss.on('error', logTo(deps.logger));
  }

  /** pg-boss's connection pool, for the metrics; null before start and after stop. */
  pool(): pg.Pool | null {
    const pool: unknown = Reflect.get(this.boss.getDb(), 'pool');
    return pool instanceof pg.Pool && !pool.ending ? pool : null;
  }

  async start(): Promise<void> {
    await this.boss.start();
    await createQueues(this.boss);
  }

  /** The one retry policy; the environment sets its numbers (tests shorten the delay). */
  private sendOptions(name: JobName): PgBoss.SendOptions {
    return {
      retryLimit: this.deps.env.JOB_RETRY_LIMIT,
      retryDelay: this.deps.env.JOB_RETRY_DELAY_SECONDS,
      retryBackoff: true,
      expireInSeconds: JOBS[name].expireInSeconds,
    };
  }

  /** Inserts the job through the write's own transaction; returns its id (null when a stately queue has one waiting). */
  async enqueue<N extends JobName>(tx: EntityManager, name: N, data: JobPayload<N>): Promise<string | null> {
    const runner = tx.queryRunner;
    if (!runner?.isTransactionActive) throw new Error(`job ${name}: enqueue inside the transaction of the write it follows`);
    const payload: object = JOBS[name].schema.parse(data);
    const db: PgBoss.Db = { executeSql: async (text, values) => ({ rows: (await runner.query(text, values, true)).records }) };
    const id = await this.boss.send(name, payload, { ...this.sendOptions(name), db });
    await runner.query(`SELECT pg_notify($1, $2)`, [WAKE_CHANNEL, name]);
    return id;
  }

  /** A failed job gets one more attempt, at once. */
  async retry(name: JobName, id: string): Promise<void> {
    await this.boss.retry(name, id);
    await this.boss.getDb().executeSql(`SELECT pg_notify($1, $2)`, [WAKE_CHANNEL, name]);
  }

  async startWorkers(): Promise<void> {
    const pollingIntervalSeconds = this.deps.env.JOB_POLL_SECONDS;
    for (const name of JOB_NAMES) {
      const { batchSize } = JOBS[name];
      const id = await this.boss.work<unknown>(name, { batchSize, pollingIntervalSeconds, includeMetadata: true }, (jobs) =>
        this.run(name, jobs),
      );
      this.workerIds.set(name, id);
    }
    this.wake = await listenForNewJobs(this.deps.env.DATABASE_URL, this.deps.logger, (name) => {
      const id = this.workerIds.get(name);
      if (id) this.boss.notifyWorker(id);
    });
  }

  private async run(name: JobName, jobs: PgBoss.JobWithMetadata<unknown>[]): Promise<void> {
    const job: JobDefinition = JOBS[name];
    try {
      await job.handle(
        this.deps,
        jobs.map((j) => job.schema.parse(j.data)),
      );
    } catch (err) {
      const message = err instanceof Error ? err.message : String(err);
      for (const j of jobs) {
        const next = j.retryCount < j.retryLimit ? 'will retry' : 'out of attempts, kept on the Jobs page';
        this.deps.logger.error(
          { job: name, jobId: j.id, attempt: j.retryCount + 1, attempts: j.retryLimit + 1, next, error: message },
          `job ${name} failed (${next})`,
        );
      }
      throw err;
    }
  }

  /** Lets running jobs finish (up to a limit), then closes the queue's connections. */
  async stop(): Promise<void> {
    await this.wake?.close();
    this.wake = null;
    await this.boss.stop({ graceful: true, wait: true, timeout: 20_000 });
  }
}
