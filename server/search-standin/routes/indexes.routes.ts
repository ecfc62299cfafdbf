/** Index lifecycle: list, create, read, update the primary key, delete, stats. */
import { Router } from 'express';
import { isJsonObject } from '../field-paths';
import { assertValidIndexUid } from '../index-catalog';
import { badRequest } from '../meili-error';
import { queryInteger } from '../request-values';
import type { StandinState } from '../standin-state';

function readPrimaryKey(body: Record<string, unknown>): string | null {
  const primaryKey = body.primaryKey;
  if (primaryKey === undefined || primaryKey === null) return null;
  if (typeof primaryKey !== 'string')
    throw badRequest('invalid_index_primary_key', 'Invalid value type at `.primaryKey`: expected a string.');
  return primaryKey;
}

export function indexesRoutes({ catalog, tasks }: StandinState): Router {
  const router = Router();

  router.get('/indexes', (req, res) => {
    const offset = queryInteger(req.query.offset, 'indexOffset', 0);
    const limit = queryInteger(req.query.limit, 'indexLimit', 20);
    const all = catalog.list();
    res.json({ results: all.slice(offset, offset + limit).map((index) => index.info()), offset, limit, total: all.length });
  });

  router.post('/indexes', (req, res) => {
    const body: unknown = req.body;
    if (!isJsonObject(body) || body.uid === undefined) throw badRequest('missing_index_uid', 'Missing field `uid`');
    const uid = assertValidIndexUid(body.uid);
    const primaryKey = readPrimaryKey(body);
    const enqueued = tasks.enqueue(uid, 'indexCreation', { primaryKey }, () => {
      catalog.create(uid, primaryKey);
    });
    res.status(202).json(enqueued);
  });

  router.get('/indexes/:uid', (req, res) => {
    res.json(catalog.get(assertValidIndexUid(req.params.uid)).info());
  });

  router.patch('/indexes/:uid', (req, res) => {
    const uid = assertValidIndexUid(req.params.uid);
    const body: unknown = req.body;
    const primaryKey = isJsonObject(body) ? readPrimaryKey(body) : null;
    const enqueued = tasks.enqueue(uid, 'indexUpdate', { primaryKey }, () => {
      const index = catalog.get(uid);
      if (primaryKey !== null) index.setPrimaryKey(primaryKey);
    });
    res.status(202).json(enqueued);
  });

  router.delete('/indexes/:uid', (req, res) => {
    const uid = assertValidIndexUid(req.params.uid);
    const details: Record<string, unknown> = { deletedDocuments: null };
    const enqueued = tasks.enqueue(uid, 'indexDeletion', details, () => {
      try {
        return { deletedDocuments: catalog.delete(uid) };
      } catch (error) {
        details.deletedDocuments = 0;
        throw error;
      }
    });
    res.status(202).json(enqueued);
  });

  router.get('/indexes/:uid/stats', (req, res) => {
    const uid = assertValidIndexUid(req.params.uid);
    const index = catalog.get(uid);
    res.json({
      numberOfDocuments: index.documentCount,
      rawDocumentDbSize: 0,
      avgDocumentSize: 0,
      isIndexing: tasks.isIndexing(uid),
      numberOfEmbeddings: 0,
      numberOfEmbeddedDocuments: 0,
      fieldDistribution: index.fieldDistribution(),
    });
  });

  return router;
}
