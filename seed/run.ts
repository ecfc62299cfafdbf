import 'reflect-metadata';
import { loadEnv } from '../server/config/env';
import { createDataSource } from '../server/db/data-source';
import { seedAll } from './seed-all';

/**
 * Runs pending migrations, then seeds the demo scenario idempotently (a second run changes
 * nothing). One process for both saves a second start-up on every `npm start`.
 */
async function main(): Promise<void> {
  const env = loadEnv();
  const ds = await createDataSource(env.DATABASE_URL).initialize();
  const ran = await ds.runMigrations({ transaction: 'each' });
  console.log(`migrations: ${ran.length} applied`);
  const counts = await seedAll(ds);
  console.log(`seed: ${JSON.stringify(counts)}`);
  await ds.destroy();
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
