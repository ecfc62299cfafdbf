import { Router } from 'express';
import swaggerUi from 'swagger-ui-express';
import { mount } from '../routes/mount';
import { openApiDocument } from './document';

export const OPENAPI_PATH = '/api/openapi.json';
export const DOCS_PATH = '/api/docs';
/** The docs page is a page, not an API route: public, and declared here for the test that walks every route. */
export const DOCS_ACCESS = { [`GET ${DOCS_PATH}`]: 'public' } as const;

/** GET /api/openapi.json: the document, public like the docs page that reads it. */
export function openApiRoutes(): Router {
  const r = Router();
  mount(r, 'GET /api/openapi.json', (_req, res) => {
    res.json(openApiDocument());
  });
  return r;
}

/**
 * The docs page: Swagger UI from swagger-ui-dist, served by the app itself (no outside network),
 * reading the document above. Scripts load from this origin only, so the app's CSP holds as is.
 */
export function docsPage(): Router {
  const options = {
    swaggerUrl: OPENAPI_PATH,
    customSiteTitle: 'Arcwise API',
    // null: no badge fetched from the public validator service.
    swaggerOptions: { validatorUrl: null, docExpansion: 'list', defaultModelsExpandDepth: 0 },
  };
  const r = Router();
  // The page loads its assets by relative paths ("./swagger-ui.css"): it must be read as a folder.
  r.get(DOCS_PATH, (req, res, next) => {
    if (req.originalUrl.split('?')[0]!.endsWith('/')) return next();
    res.redirect(301, `${DOCS_PATH}/`);
  });
  r.use(DOCS_PATH, swaggerUi.serveFiles(undefined, options), swaggerUi.setup(undefined, options));
  return r;
}
