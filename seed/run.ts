import 'reflect-metadata';
import { loadEnv } from '../server/config/env';
import { createDataSource } from '../server/db/data-source';
import { seedUsers } from './users';

/** Seeds the demo scenario, idempotently: a second run changes nothing. */
async function main(): Promise<void> {
  const env = loadEnv();
  const ds = await createDataSource(env.DATABASE_URL).initialize();
  const users = await ds.transaction((m) => seedUsers(m));
  console.log(`seed: ${users} users created`);
  await ds.destroy();
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
