import type { Request } from 'express';
import { match } from 'path-to-regexp';
import { ROUTE_ACCESS } from '../routes/route-access';

/** Requests that matched no route (404s, static files) share one label, so a scan cannot add series. */
export const UNMATCHED_ROUTE = '(unmatched)';

/** The API's routes, to name a request refused before it reached its route (an unknown API key, say). */
const API_ROUTES = Object.keys(ROUTE_ACCESS).map((key) => {
  const [method, path] = key.split(' ') as [string, string];
  return { method, path, matches: match(path) };
});

/**
 * The Express route a request matched, as declared (`/api/parts/:id`), never the URL it came with:
 * a metrics label and a log field that stay few, and that hold no ids or tokens.
 */
export function routePattern(req: Request): string {
  const route: unknown = req.route;
  if (typeof route === 'object' && route !== null && 'path' in route && typeof route.path === 'string') {
    return `${req.baseUrl}${route.path}`;
  }
  const path = req.originalUrl.split('?')[0] ?? '';
  return API_ROUTES.find((r) => r.method === req.method && r.matches(path))?.path ?? UNMATCHED_ROUTE;
}
