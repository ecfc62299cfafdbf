import type pg from 'pg';
import type { DataSource } from 'typeorm';
import type { Env } from './config/env';
import type { JobQueue } from './jobs/queue';
import type { Mailer } from './mail/mailer';
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
}
