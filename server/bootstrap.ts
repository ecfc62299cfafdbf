import pg from 'pg';
import type { Env } from './config/env';
import { createDataSource } from './db/data-source';
import type { AppDeps } from './deps';
import { JobQueue } from './jobs/queue';
import { createMailer } from './mail/mailer';
import { createLogger } from './observability/logger';
import { createMetrics } from './observability/metrics';
import { PartSearchIndex } from './search/search-index';
import { keyCallsRecorded } from './services/api-keys.service';

/** Database first, then everything that depends on it; the app is built from these. */
export async function buildDeps(env: Env): Promise<AppDeps> {
  if (!env.SMTP_URL) throw new Error('SMTP_URL is not set: start the local mail catcher first.');
  const dataSource = await createDataSource(env.DATABASE_URL, env.DATABASE_REPLICA_URLS).initialize();
  const logger = createLogger(env);
  const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 10 });
  // An idle client whose connection drops (a database restart, a failover) is dropped from the pool;
  // without a listener that error would end the process.
  pool.on('error', (err) => logger.warn({ error: err.message }, 'database connection lost (app pool)'));
  if (!env.MEILI_HOST) throw new Error('MEILI_HOST is not set: start the local search stand-in first.');
  const mailer = createMailer(env.SMTP_URL, env.MAIL_FROM);
  const search = new PartSearchIndex(env.MEILI_HOST, env.MEILI_API_KEY, env.MEILI_INDEX);
  // Every process enqueues, so the queue's schema is made here; its workers start apart (startWorkers).
  const jobs = new JobQueue({ env, dataSource, search, mailer, logger });
  await jobs.start();
  const metrics = createMetrics({ dataSource, pool, jobsPool: () => jobs.pool(), logger });
  return { env, dataSource, pool, mailer, search, jobs, logger, metrics, lifecycle: { stopping: false } };
}

export async function closeDeps(deps: AppDeps): Promise<void> {
  await keyCallsRecorded();
  await deps.jobs.stop();
  deps.mailer.close();
  await deps.pool.end();
  await deps.dataSource.destroy();
  deps.logger.flush();
}
