import 'reflect-metadata';
import { createDataSource } from '../../server/db/data-source';
import { seedAll } from '../../seed/seed-all';
import { seedScale } from '../../seed/scale';

/**
 * Everything the bench parts need, made once at the start of `npm run bench` on its own database
 * (a fresh machine has an empty one): the demo scenario (the import bench's file names one of its
 * brands and the search bench signs in as its clerk) and the scale data set. Both are idempotent.
 */
export async function prepareBenchDatabase(databaseUrl: string): Promise<void> {
  const ds = await createDataSource(databaseUrl).initialize();
  try {
    await ds.runMigrations({ transaction: 'each' });
    await seedAll(ds);
  } finally {
    await ds.destroy();
  }
  const scale = await seedScale(databaseUrl);
  if (scale.parts)
    console.log(`  scale data generated: ${scale.parts} parts, ${scale.interchange} interchange rows in ${(scale.ms / 1000).toFixed(1)} s`);
}
