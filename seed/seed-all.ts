import type { DataSource } from 'typeorm';
import { seedCatalog, type CatalogCounts } from './catalog';
import { seedUsers } from './users';

export interface SeedCounts extends CatalogCounts {
  users: number;
}

/** The whole demo scenario, idempotent; used by `npm start` and by the tests' global set-up. */
export async function seedAll(ds: DataSource): Promise<SeedCounts> {
  const users = await ds.transaction((m) => seedUsers(m));
  const catalog = await ds.transaction((m) => seedCatalog(m));
  return { users, ...catalog };
}
