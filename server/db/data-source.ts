import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { ENTITIES } from '../entities';
import { MIGRATIONS } from '../migrations';

/** Builds the one DataSource of the app; schema comes from migrations only. */
export function createDataSource(url: string): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    synchronize: false,
    migrationsRun: false,
    logging: ['error'],
    extra: { max: 10 },
  });
}
