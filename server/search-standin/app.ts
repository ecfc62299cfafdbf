/** The stand-in's HTTP routes: the part of Meilisearch's API the `meilisearch` SDK calls for the app. */
import express, { type ErrorRequestHandler, type Express, type RequestHandler, type Response } from 'express';
import { MeiliError, badRequest, indexNotFound, toMeiliError } from './meili-error';
import { StandinIndex, type SearchBody, type Settings } from './standin-index';
import { TaskQueue } from './tasks';
import type { Doc } from './filter';

export interface StandinState {
  indexes: Map<string, StandinIndex>;
  tasks: TaskQueue;
}

const UID = /^[A-Za-z0-9_-]{1,400}$/;

export const createState = (): StandinState => ({ indexes: new Map(), tasks: new TaskQueue() });

/** Bearer key check as Meilisearch does with a master key: none 401, a wrong one 403; `/health` stays open. */
function requireKey(masterKey: string | undefined): RequestHandler {
  return (req, _res, next) => {
    if (!masterKey || req.path === '/health') return next();
    const header = req.get('authorization');
    const missing = 'The Authorization header is missing. It must use the bearer authorization method.';
    if (!header) return next(new MeiliError(401, 'missing_authorization_header', missing, 'auth'));
    if (header !== `Bearer ${masterKey}`) return next(new MeiliError(403, 'invalid_api_key', 'The provided API key is invalid.', 'auth'));
    next();
  };
}

const errorHandler: ErrorRequestHandler = (error: unknown, _req, res, _next) => {
  void _next;
  const type = typeof error === 'object' && error !== null && 'type' in error ? String(error.type) : '';
  const malformed = type === 'entity.parse.failed' && badRequest('malformed_payload', 'The json payload provided is malformed.');
  const meili =
    malformed ||
    (type === 'entity.too.large' ? new MeiliError(413, 'payload_too_large', 'The payload is too large.') : toMeiliError(error));
  if (meili.status >= 500) console.error('[search stand-in]', error);
  res.status(meili.status).json(meili.toBody());
};

export function createStandinApp(state: StandinState, masterKey?: string): Express {
  const { indexes, tasks } = state;
  const app = express();
  app.disable('x-powered-by');
  app.disable('etag');
  app.use(requireKey(masterKey));
  // 10,000 part documents are several megabytes; Meilisearch's own limit is 100 MB.
  app.use(express.json({ limit: '100mb' }));

  const existing = (uid: string): StandinIndex => {
    const index = indexes.get(uid);
    if (!index) throw indexNotFound(uid);
    return index;
  };
  /** Meilisearch creates a missing index on a documents or settings write. */
  const ensure = (uid: string, primaryKey?: string): StandinIndex => {
    if (!UID.test(uid)) throw badRequest('invalid_index_uid', `\`${uid}\` is not a valid index uid.`);
    let index = indexes.get(uid);
    if (!index) indexes.set(uid, (index = new StandinIndex(primaryKey ?? null)));
    return index;
  };
  /** Answers 202 with the enqueued task. */
  const accept = (res: Response, ...task: Parameters<TaskQueue['enqueue']>) => void res.status(202).json(tasks.enqueue(...task));

  app.get('/health', (_req, res) => void res.json({ status: 'available' }));

  app.post('/indexes', (req, res) => {
    const { uid, primaryKey } = (req.body ?? {}) as { uid?: unknown; primaryKey?: unknown };
    if (typeof uid !== 'string' || !UID.test(uid)) throw badRequest('invalid_index_uid', '`uid` must be a valid index uid.');
    const pk = typeof primaryKey === 'string' ? primaryKey : null;
    accept(res, uid, 'indexCreation', { primaryKey: pk }, () => {
      if (indexes.has(uid)) throw new MeiliError(409, 'index_already_exists', `Index \`${uid}\` already exists.`);
      indexes.set(uid, new StandinIndex(pk));
    });
  });
  app.get('/indexes/:uid', (req, res) => {
    const { primaryKey, createdAt, updatedAt } = existing(req.params.uid);
    res.json({ uid: req.params.uid, primaryKey, createdAt, updatedAt });
  });
  app.delete('/indexes/:uid', (req, res) => {
    const { uid } = req.params;
    accept(res, uid, 'indexDeletion', {}, () => {
      const deletedDocuments = existing(uid).docs.size;
      indexes.delete(uid);
      return { deletedDocuments };
    });
  });
  app.patch('/indexes/:uid/settings', (req, res) => {
    const patch = (req.body ?? {}) as Partial<Settings>;
    accept(res, req.params.uid, 'settingsUpdate', { ...patch }, () => ensure(req.params.uid).updateSettings(patch));
  });

  app.post('/indexes/:uid/documents', (req, res) => {
    const body: unknown = req.body;
    const docs = (Array.isArray(body) ? body : [body]) as Doc[];
    if (!docs.every((d) => typeof d === 'object' && d !== null && !Array.isArray(d))) {
      throw badRequest('malformed_payload', 'Documents are a JSON object or an array of objects.');
    }
    const primaryKey = typeof req.query.primaryKey === 'string' ? req.query.primaryKey : undefined;
    const details = { receivedDocuments: docs.length, indexedDocuments: null };
    accept(res, req.params.uid, 'documentAdditionOrUpdate', details, async () => ({
      indexedDocuments: await ensure(req.params.uid, primaryKey).addDocuments(docs, primaryKey),
    }));
  });
  app.post('/indexes/:uid/documents/delete-batch', (req, res) => {
    const ids: unknown = req.body;
    if (!Array.isArray(ids)) throw badRequest('malformed_payload', 'delete-batch takes an array of document ids.');
    accept(res, req.params.uid, 'documentDeletion', { providedIds: ids.length, deletedDocuments: null }, () => ({
      deletedDocuments: existing(req.params.uid).deleteDocuments(ids),
    }));
  });
  app.get('/indexes/:uid/stats', (req, res) => {
    const { docs } = existing(req.params.uid);
    res.json({ numberOfDocuments: docs.size, isIndexing: false, fieldDistribution: {} });
  });

  app.get('/indexes/:uid/documents/:id', (req, res) => {
    const doc = existing(req.params.uid).docs.get(req.params.id);
    if (!doc) throw new MeiliError(404, 'document_not_found', `Document \`${req.params.id}\` not found.`);
    res.json(doc);
  });
  app.post('/indexes/:uid/search', (req, res) => void res.json(existing(req.params.uid).search((req.body ?? {}) as SearchBody)));

  app.post('/swap-indexes', (req, res) => {
    const swaps: unknown = req.body;
    // `rename: true` (rename rather than swap) is not served by the stand-in.
    const pairs = (Array.isArray(swaps) ? swaps : [null]).map(
      (s: { indexes?: unknown; rename?: unknown } | null) => !s?.rename && s?.indexes,
    );
    if (!pairs.every((p) => Array.isArray(p) && p.length === 2 && p.every((u) => typeof u === 'string'))) {
      throw badRequest('invalid_swap_indexes', 'Each swap names exactly two indexes: `[{ "indexes": ["a", "b"] }]`.');
    }
    accept(res, null, 'indexSwap', { swaps }, () => {
      // Every index must exist before anything is swapped.
      for (const pair of pairs as string[][]) pair.forEach(existing);
      for (const [a, b] of pairs as [string, string][]) {
        const [ia, ib] = [existing(a), existing(b)];
        indexes.set(a, ib);
        indexes.set(b, ia);
      }
    });
  });

  app.get('/tasks/:uid', (req, res) => {
    const task = tasks.get(Number(req.params.uid));
    if (!task) throw new MeiliError(404, 'task_not_found', `Task \`${req.params.uid}\` not found.`);
    res.json(task);
  });

  app.use((req, _res, next) =>
    next(new MeiliError(404, 'not_found', `\`${req.method} ${req.path}\` is not served by the search stand-in.`)),
  );
  app.use(errorHandler);
  return app;
}
