import type pg from 'pg';
import type { DataSource } from 'typeorm';
import type { Env } from './config/env';
import type { JobQueue } from './jobs/queue';
import type { Lifecycle } from './lifecycle';
import type { Mailer } from './mail/mailer';
import type { Logger } from './observability/logger';
import type { Metrics } from './observability/metrics';
import type { PartSearchIndex } from './search/search-index';

/** Everything the app needs from outside, built once by server/bootstrap.ts (or by a test). */
export interface AppDeps {
  env: Env;
  dataSource: DataSource;
  /** A plain pg pool for the session store and COPY streams. */
  pool: pg.Pool;
  mailer: Mailer;
  search: PartSearchIndex;
  /** Follow-up work after a commit (search index, mail), queued in PostgreSQL. */
  jobs: JobQueue;
  /** JSON lines (pino); per request, use `req.log`, which carries the request id. */
  logger: Logger;
  /** Prometheus metrics of this process, served at /metrics. */
  metrics: Metrics;
  lifecycle: Lifecycle;
}
