import type { RequestHandler } from 'express';
import type { Metrics } from './metrics';
import { routePattern } from './route-pattern';

/** Times every request to its last byte and counts it under the route it matched. */
export function requestMetrics(metrics: Metrics): RequestHandler {
  return (req, res, next) => {
    const started = process.hrtime.bigint();
    res.once('finish', () => {
      const seconds = Number(process.hrtime.bigint() - started) / 1e9;
      metrics.observeRequest({ method: req.method, route: routePattern(req), status: res.statusCode }, seconds);
    });
    next();
  };
}
