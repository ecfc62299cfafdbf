import 'reflect-metadata';
import { loadEnv } from '../server/config/env';
import { createDataSource } from '../server/db/data-source';
import { seedAll } from './seed-all';

/** Seeds the demo scenario, idempotently: a second run changes nothing. */
async function main(): Promise<void> {
  const env = loadEnv({ ...process.env, SMTP_URL: process.env.SMTP_URL ?? 'smtp://127.0.0.1:1' });
  const ds = await createDataSource(env.DATABASE_URL).initialize();
  const counts = await seedAll(ds);
  console.log(`seed: ${JSON.stringify(counts)}`);
  await ds.destroy();
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
