import express, { type Express } from 'express';
import type { AppDeps } from './deps';
import { errorHandler } from './middleware/error-handler';
import { requestLog } from './observability/request-log';
import { requestMetrics } from './observability/request-metrics';
import { metricsRoutes, probeRoutes } from './routes/ops.routes';

/** The worker's HTTP side: /healthz, /readyz and /metrics only (no sessions: metrics from loopback). */
export function createOpsApp(deps: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  app.use(requestLog(deps.logger), requestMetrics(deps.metrics));
  app.use(probeRoutes(deps), metricsRoutes(deps));
  app.use(errorHandler);
  return app;
}
