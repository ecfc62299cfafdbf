/** Documents: add or replace (POST), add or update (PUT), read, and the three ways to delete. */
import { Router, type Request, type Response } from 'express';
import { normalizeRequestedId } from '../document-ids';
import { isJsonObject, pickAttributes, type JsonObject } from '../field-paths';
import { compileFilter } from '../filter-evaluator';
import { assertValidIndexUid } from '../index-catalog';
import { badRequest, MeiliError } from '../meili-error';
import { queryInteger, queryList, queryString } from '../request-values';
import type { StandinIndex, WriteMode } from '../standin-index';
import type { StandinState } from '../standin-state';

function malformed(message: string): MeiliError {
  return badRequest('malformed_payload', message);
}

/** JSON (an array or one object) or NDJSON; CSV is not supported by the stand-in. */
function readDocuments(req: Request): JsonObject[] {
  const contentType = req.get('content-type') ?? 'application/json';
  const body: unknown = req.body;
  let documents: unknown[];
  if (contentType.startsWith('application/x-ndjson')) {
    const text = typeof body === 'string' ? body : '';
    try {
      documents = text
        .split('\n')
        .filter((line) => line.trim() !== '')
        .map((line): unknown => JSON.parse(line));
    } catch (error) {
      throw malformed(`The ndjson payload provided is malformed. ${error instanceof Error ? error.message : ''}`);
    }
  } else if (contentType.startsWith('application/json')) {
    documents = Array.isArray(body) ? body : [body];
  } else {
    throw new MeiliError(
      415,
      'invalid_content_type',
      `The Content-Type \`${contentType}\` is invalid. The search stand-in accepts \`application/json\` and \`application/x-ndjson\`.`,
    );
  }
  for (const doc of documents) {
    if (!isJsonObject(doc))
      throw malformed(
        "The `json` payload provided is malformed. `Couldn't serialize document value: data are neither an object nor a list of objects`.",
      );
  }
  return documents as JsonObject[];
}

/** `fields` as attributes to keep, or null for all; the display settings still apply. */
function visibleAttributes(index: StandinIndex, fields: string[] | undefined): string[] | null {
  const displayed = index.resolved.displayedAttributes;
  const asked = fields && !fields.includes('*') ? fields : null;
  if (!asked) return displayed;
  return displayed ? asked.filter((field) => displayed.includes(field)) : asked;
}

function browse(
  index: StandinIndex,
  offset: number,
  limit: number,
  fields: string[] | undefined,
  filter: unknown,
  ids: string[] | null,
): JsonObject {
  const predicate = compileFilter(filter, index.resolved.filterableRules);
  const attributes = visibleAttributes(index, fields);
  const wanted = ids ? new Set(ids) : null;
  const matching = [...index.records.values()].filter((record) => (!wanted || wanted.has(record.id)) && (!predicate || predicate(record)));
  const results = matching.slice(offset, offset + limit).map((record) => pickAttributes(record.doc, attributes));
  return { results, offset, limit, total: matching.length };
}

function documentFilterError(error: unknown): unknown {
  if (error instanceof MeiliError && error.code === 'invalid_search_filter') {
    return new MeiliError(error.status, 'invalid_document_filter', error.message);
  }
  return error;
}

export function documentsRoutes({ catalog, tasks }: StandinState): Router {
  const router = Router();

  const write = (mode: WriteMode) => (req: Request, res: Response) => {
    const uid = assertValidIndexUid(req.params.uid);
    const documents = readDocuments(req);
    const primaryKey = queryString(req.query.primaryKey) ?? null;
    const details: JsonObject = { receivedDocuments: documents.length, indexedDocuments: null };
    const enqueued = tasks.enqueue(uid, 'documentAdditionOrUpdate', details, () => {
      try {
        return { indexedDocuments: catalog.getOrCreate(uid).writeDocuments(documents, mode, primaryKey) };
      } catch (error) {
        details.indexedDocuments = 0;
        throw error;
      }
    });
    res.status(202).json(enqueued);
  };
  router.post('/indexes/:uid/documents', write('replace'));
  router.put('/indexes/:uid/documents', write('update'));

  router.get('/indexes/:uid/documents', (req, res) => {
    const index = catalog.get(assertValidIndexUid(req.params.uid));
    const offset = queryInteger(req.query.offset, 'documentOffset', 0);
    const limit = queryInteger(req.query.limit, 'documentLimit', 20);
    try {
      res.json(browse(index, offset, limit, queryList(req.query.fields), queryString(req.query.filter), queryList(req.query.ids) ?? null));
    } catch (error) {
      throw documentFilterError(error);
    }
  });

  router.post('/indexes/:uid/documents/fetch', (req, res) => {
    const index = catalog.get(assertValidIndexUid(req.params.uid));
    const body: unknown = req.body ?? {};
    if (!isJsonObject(body)) throw badRequest('bad_request', 'Invalid value type: expected an object.');
    const count = (value: unknown, fallback: number): number =>
      typeof value === 'number' && Number.isInteger(value) && value >= 0 ? value : fallback;
    const fields = Array.isArray(body.fields) ? body.fields.filter((field): field is string => typeof field === 'string') : undefined;
    const ids = Array.isArray(body.ids) ? body.ids.map(normalizeRequestedId).filter((id): id is string => id !== null) : null;
    try {
      res.json(browse(index, count(body.offset, 0), count(body.limit, 20), fields, body.filter, ids));
    } catch (error) {
      throw documentFilterError(error);
    }
  });

  router.get('/indexes/:uid/documents/:id', (req, res) => {
    const index = catalog.get(assertValidIndexUid(req.params.uid));
    const record = index.records.get(req.params.id);
    if (!record) throw new MeiliError(404, 'document_not_found', `Document \`${req.params.id}\` not found.`);
    res.json(pickAttributes(record.doc, visibleAttributes(index, queryList(req.query.fields))));
  });

  const deletion = (uid: string, providedIds: number, originalFilter: string | null, run: (index: StandinIndex) => number) => {
    const details: JsonObject = { providedIds, deletedDocuments: null, originalFilter };
    return tasks.enqueue(uid, 'documentDeletion', details, () => {
      try {
        return { deletedDocuments: run(catalog.get(uid)) };
      } catch (error) {
        details.deletedDocuments = 0;
        throw documentFilterError(error);
      }
    });
  };

  router.delete('/indexes/:uid/documents/:id', (req, res) => {
    const uid = assertValidIndexUid(req.params.uid);
    const id = req.params.id;
    res.status(202).json(deletion(uid, 1, null, (index) => index.deleteDocuments([id])));
  });

  router.post('/indexes/:uid/documents/delete-batch', (req, res) => {
    const uid = assertValidIndexUid(req.params.uid);
    const body: unknown = req.body;
    if (!Array.isArray(body)) throw badRequest('bad_request', 'Invalid value type: expected an array of document ids.');
    const ids = body.map(normalizeRequestedId);
    if (ids.some((id) => id === null)) throw badRequest('bad_request', 'Document ids must be strings or integers.');
    const wanted = ids.filter((id): id is string => id !== null);
    res.status(202).json(deletion(uid, wanted.length, null, (index) => index.deleteDocuments(wanted)));
  });

  router.post('/indexes/:uid/documents/delete', (req, res) => {
    const uid = assertValidIndexUid(req.params.uid);
    const body: unknown = req.body;
    const filter = isJsonObject(body) ? body.filter : undefined;
    if (filter === undefined || filter === null) throw badRequest('missing_document_filter', 'Missing field `filter`');
    res.status(202).json(
      deletion(uid, 0, JSON.stringify(filter), (index) => {
        const predicate = compileFilter(filter, index.resolved.filterableRules);
        return predicate ? index.deleteMatching(predicate) : 0;
      }),
    );
  });

  router.delete('/indexes/:uid/documents', (req, res) => {
    const uid = assertValidIndexUid(req.params.uid);
    res.status(202).json(deletion(uid, 0, null, (index) => index.deleteAll()));
  });

  return router;
}
