import 'reflect-metadata';
import path from 'node:path';
import cookieParser from 'cookie-parser';
import express, { Router, type Express } from 'express';
import helmet from 'helmet';
import type { PassportStatic } from 'passport';
import type { AppDeps } from './deps';
import { apiKeyAuth, forPeople } from './middleware/api-key';
import { clientFiles } from './middleware/client-files';
import { csrfErrorToAppError, csrfProtection } from './middleware/csrf';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import { configurePassport } from './middleware/passport';
import { sessionMiddleware } from './middleware/session';
import { docsPage, openApiRoutes } from './openapi/docs.routes';
import { checkResponses } from './openapi/response-check';
import { apiKeyRoutes } from './routes/api-keys.routes';
import { requestLog } from './observability/request-log';
import { requestMetrics } from './observability/request-metrics';
import { authRoutes } from './routes/auth.routes';
import { catalogRoutes } from './routes/catalog.routes';
import { compatRoutes } from './routes/compat.routes';
import { fitReportRoutes } from './routes/fit-reports.routes';
import { jobsRoutes } from './routes/jobs.routes';
import { locationsRoutes } from './routes/locations.routes';
import { metricsRoutes, probeRoutes } from './routes/ops.routes';
import { settingsRoutes } from './routes/settings.routes';
import { priceListRoutes } from './routes/price-lists.routes';
import { supplierRoutes } from './routes/suppliers.routes';
import { usersRoutes } from './routes/users.routes';

/** Every API route, mounted with full paths on one router so the tests can read its table. */
export function buildApiRouter(deps: AppDeps, csrf: ReturnType<typeof csrfProtection>, passport: PassportStatic): Router {
  const api = Router();
  api.use(authRoutes(deps, csrf, passport));
  api.use(usersRoutes(deps));
  api.use(catalogRoutes(deps));
  api.use(compatRoutes(deps));
  api.use(fitReportRoutes(deps));
  api.use(settingsRoutes(deps));
  api.use(supplierRoutes(deps));
  api.use(priceListRoutes(deps));
  api.use(jobsRoutes(deps));
  api.use(locationsRoutes(deps));
  api.use(openApiRoutes());
  api.use(apiKeyRoutes(deps));
  return api;
}

/** Builds the app without listening, so supertest can import it. */
export function createApp(deps: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  if (deps.env.TRUST_PROXY) app.set('trust proxy', 1);
  // First, so every response carries its X-Request-Id and every request is timed.
  app.use(requestLog(deps.logger), requestMetrics(deps.metrics));
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'img-src': ["'self'", 'data:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'font-src': ["'self'", 'data:'],
          'script-src': ["'self'"],
          'connect-src': ["'self'"],
          'upgrade-insecure-requests': deps.env.COOKIE_SECURE ? [] : null,
        },
      },
    }),
  );
  app.use(probeRoutes(deps));
  // In the API tests every answer is held against the OpenAPI document.
  if (deps.env.NODE_ENV === 'test') app.use('/api', checkResponses());
  app.use('/api', express.json({ limit: '2mb' }));
  app.use(cookieParser());
  // A call with an API key is judged by the key alone: no session is read for it, none is made.
  app.use('/api', apiKeyAuth(deps));
  app.use(forPeople(sessionMiddleware(deps)));
  const passport = configurePassport(deps.dataSource);
  app.use(forPeople(passport.session()));
  app.use(metricsRoutes(deps));

  const csrf = csrfProtection(deps.env);
  app.use('/api', csrf.doubleCsrfProtection, csrfErrorToAppError);
  app.use(docsPage());
  const api = buildApiRouter(deps, csrf, passport);
  app.locals.apiRouter = api;
  app.use(api);
  app.use('/api', notFoundHandler);

  if (deps.env.STATIC_DIR) app.use(clientFiles(path.resolve(deps.env.STATIC_DIR)));
  app.use(errorHandler);
  return app;
}
