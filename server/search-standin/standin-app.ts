/** The Express app of the stand-in, built without listening so tests can also mount it directly. */
import express, { type ErrorRequestHandler, type Express } from 'express';
import { requireApiKey } from './auth';
import { MeiliError, toMeiliError } from './meili-error';
import { documentsRoutes } from './routes/documents.routes';
import { indexesRoutes } from './routes/indexes.routes';
import { instanceRoutes } from './routes/instance.routes';
import { searchRoutes } from './routes/search.routes';
import { settingsRoutes } from './routes/settings.routes';
import { tasksRoutes } from './routes/tasks.routes';
import type { StandinState } from './standin-state';

/** Batches of 10,000 part documents are several megabytes; Meilisearch's own default is 100 MB. */
const BODY_LIMIT = '200mb';

function bodyParserError(error: unknown): MeiliError | null {
  if (typeof error !== 'object' || error === null || !('type' in error)) return null;
  const message = error instanceof Error ? error.message : 'Invalid request body.';
  if (error.type === 'entity.parse.failed')
    return new MeiliError(400, 'malformed_payload', `The json payload provided is malformed. ${message}`);
  if (error.type === 'entity.too.large')
    return new MeiliError(413, 'payload_too_large', `The provided payload reached the size limit of ${BODY_LIMIT}.`);
  return null;
}

const errorHandler: ErrorRequestHandler = (error: unknown, _req, res, next) => {
  if (res.headersSent) {
    next(error);
    return;
  }
  const meiliError = bodyParserError(error) ?? toMeiliError(error);
  if (meiliError.status >= 500) console.error('[search-standin]', error);
  res.status(meiliError.status).json(meiliError.toBody());
};

export function createStandinApp(state: StandinState, apiKey?: string): Express {
  const app = express();
  app.disable('x-powered-by');
  app.disable('etag');
  app.use(requireApiKey(apiKey));
  // strict: false because single-setting routes take bare JSON strings (distinct-attribute).
  app.use(express.json({ limit: BODY_LIMIT, strict: false, type: ['application/json', '+json'] }));
  app.use(express.text({ limit: BODY_LIMIT, type: ['application/x-ndjson', 'text/csv'] }));
  app.use(instanceRoutes(state));
  app.use(indexesRoutes(state));
  app.use(documentsRoutes(state));
  app.use(settingsRoutes(state));
  app.use(searchRoutes(state));
  app.use(tasksRoutes(state));
  app.use((req, _res, next) => {
    next(new MeiliError(404, 'not_found', `Route \`${req.method} ${req.path}\` is not served by the search stand-in.`));
  });
  app.use(errorHandler);
  return app;
}
