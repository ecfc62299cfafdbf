/** Instance-wide routes: health, version and global stats. */
import { Router } from 'express';
import type { StandinState } from '../standin-state';

/** The Meilisearch release whose HTTP API the stand-in follows. */
export const EMULATED_MEILISEARCH_VERSION = '1.16.0';

export function instanceRoutes({ catalog, tasks }: StandinState): Router {
  const router = Router();

  router.get('/health', (_req, res) => {
    res.json({ status: 'available' });
  });

  router.get('/version', (_req, res) => {
    res.json({ commitSha: 'search-standin', commitDate: '1970-01-01T00:00:00Z', pkgVersion: EMULATED_MEILISEARCH_VERSION });
  });

  router.get('/stats', (_req, res) => {
    const indexes: Record<string, unknown> = {};
    let lastUpdate: string | null = null;
    for (const index of catalog.list()) {
      const info = index.info();
      if (lastUpdate === null || info.updatedAt > lastUpdate) lastUpdate = info.updatedAt;
      indexes[index.uid] = {
        numberOfDocuments: index.documentCount,
        isIndexing: tasks.isIndexing(index.uid),
        fieldDistribution: index.fieldDistribution(),
      };
    }
    res.json({ databaseSize: 0, usedDatabaseSize: 0, lastUpdate, indexes });
  });

  return router;
}
