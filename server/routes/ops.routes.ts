import { Router } from 'express';
import type { Liveness, Readiness } from '../../shared/schemas/ops';
import type { AppDeps } from '../deps';
import { AppError } from '../errors';
import { allowMetricsReaders } from '../middleware/metrics-access';
import { checkReadiness, isReady } from '../services/readiness.service';

/**
 * The operations routes, outside /api: for load balancers and scrapers, not for the app's users,
 * so not in ROUTE_ACCESS (which only /api routes use). They are declared here instead, and
 * tests/server/ops/ops-routes.test.ts fails on any route of the app that is in neither table.
 */
export const OPS_ACCESS = {
  'GET /healthz': 'public',
  'GET /readyz': 'public',
  'GET /metrics': 'admin or loopback',
} as const;

/** Liveness and readiness: no session, no CSRF, no body; mounted before the session is read. */
export function probeRoutes(deps: Pick<AppDeps, 'dataSource' | 'search' | 'lifecycle'>): Router {
  const r = Router();
  r.get('/healthz', (_req, res) => {
    const body: Liveness = { status: 'ok' };
    res.json(body);
  });
  r.get('/readyz', async (req, res) => {
    if (deps.lifecycle.stopping) throw new AppError(503, 'unavailable', 'This server is shutting down.', { stopping: true });
    const checks = await checkReadiness(deps);
    if (!isReady(checks)) {
      const failed = Object.entries(checks).filter(([, c]) => c !== 'ok');
      req.log.warn({ checks }, 'not ready');
      throw new AppError(503, 'unavailable', `Not ready: ${failed.map(([name]) => name).join(' and ')} unreachable.`, checks);
    }
    const body: Readiness = { status: 'ready', checks };
    res.json(body);
  });
  return r;
}

/** Prometheus's text format; after the session is read, so an admin may look from a browser. */
export function metricsRoutes(deps: Pick<AppDeps, 'metrics'>): Router {
  const r = Router();
  r.get('/metrics', allowMetricsReaders, async (_req, res) => {
    const text = await deps.metrics.registry.metrics();
    res.type(deps.metrics.registry.contentType).send(text);
  });
  return r;
}
