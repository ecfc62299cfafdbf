import { loadEnv } from '../config/env';
import { createDataSource } from './data-source';

/** Runs pending migrations (the start and test scripts call this before seeding). */
async function main(): Promise<void> {
  const env = loadEnv();
  const ds = await createDataSource(env.DATABASE_URL).initialize();
  const ran = await ds.runMigrations({ transaction: 'each' });
  console.log(`migrations: ${ran.length} applied`);
  await ds.destroy();
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
