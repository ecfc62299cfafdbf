import type { DataSource } from 'typeorm';
import { seedUsers } from './users';

export interface SeedCounts {
  users: number;
}

/** The whole demo scenario, idempotent; used by `npm start` and by the tests' global set-up. */
export async function seedAll(ds: DataSource): Promise<SeedCounts> {
  const users = await ds.transaction((m) => seedUsers(m));
  return { users };
}
