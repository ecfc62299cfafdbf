import 'reflect-metadata';
import type { TestProject } from 'vitest/node';
import { loadEnv } from '../../server/config/env';
import { createDataSource } from '../../server/db/data-source';
import { installJobQueue } from '../../server/jobs/queue';
import { startMailCatcher } from '../../server/mail/catcher';
import { PartSearchIndex } from '../../server/search/search-index';
import { startSearchStandin } from '../../server/search-standin/server';
import { seedAll } from '../../seed/seed-all';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
    smtpUrl: string;
    mailCatcherUrl: string;
    meiliHost: string;
    meiliApiKey: string;
  }
}

/**
 * Once per run: migrate the test database (npm test made it fresh), seed the demo scenario, install
 * the job queue's schema, start the real local services on loopback — the mail catcher and the
 * search stand-in — and build the search index from PostgreSQL.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const databaseUrl = process.env.TEST_DATABASE_URL ?? process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('Set TEST_DATABASE_URL (npm test does): the server tests run against real PostgreSQL.');
  const env = loadEnv({ ...process.env, DATABASE_URL: databaseUrl, SMTP_URL: 'smtp://127.0.0.1:1' });
  const ds = await createDataSource(env.DATABASE_URL).initialize();
  await ds.runMigrations({ transaction: 'each' });
  // Sign-in failures are counted in PostgreSQL for a quarter hour; a rerun starts from none.
  await ds.query('DELETE FROM rate_limit');
  await seedAll(ds);
  // pg-boss's schema, once, before the test files' apps start their queues.
  await installJobQueue(databaseUrl);

  // A real Meilisearch when MEILI_HOST is set, else the project's stand-in.
  const standin = process.env.MEILI_HOST ? null : await startSearchStandin({ port: 0 });
  const meiliHost = process.env.MEILI_HOST ?? standin!.url;
  const meiliApiKey = process.env.MEILI_API_KEY ?? '';
  await new PartSearchIndex(meiliHost, meiliApiKey || undefined, 'parts').rebuild(ds);
  await ds.destroy();

  const catcher = await startMailCatcher();
  project.provide('meiliHost', meiliHost);
  project.provide('meiliApiKey', meiliApiKey);
  project.provide('databaseUrl', databaseUrl);
  project.provide('smtpUrl', catcher.smtpUrl);
  project.provide('mailCatcherUrl', catcher.httpUrl);
  return async () => {
    await catcher.close();
    await standin?.close();
  };
}
