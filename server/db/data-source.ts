import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { ENTITIES } from '../entities';
import { MIGRATIONS } from '../migrations';

/**
 * Builds the one DataSource of the app; schema comes from migrations only. With replica URLs,
 * TypeORM keeps a pool per server: everything goes to the primary unless asked otherwise
 * (`defaultMode: 'master'`), and only the work wrapped in `readOnly` (db/read-only.ts) reads
 * from a replica.
 */
export function createDataSource(url: string, replicaUrls: readonly string[] = []): DataSource {
  const servers = replicaUrls.length
    ? { replication: { master: { url }, slaves: replicaUrls.map((replica) => ({ url: replica })), defaultMode: 'master' as const } }
    : { url };
  return new DataSource({
    type: 'postgres',
    ...servers,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    synchronize: false,
    migrationsRun: false,
    logging: ['error'],
    extra: { max: 10 },
  });
}
