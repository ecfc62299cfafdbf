import type { Request } from 'express';

/** Requests that matched no route (404s, static files) share one label, so a scan cannot add series. */
export const UNMATCHED_ROUTE = '(unmatched)';

/**
 * The Express route a request matched, as declared (`/api/parts/:id`), never the URL it came with:
 * a metrics label and a log field that stay few, and that hold no ids or tokens.
 */
export function routePattern(req: Request): string {
  const route: unknown = req.route;
  if (typeof route === 'object' && route !== null && 'path' in route && typeof route.path === 'string') {
    return `${req.baseUrl}${route.path}`;
  }
  return UNMATCHED_ROUTE;
}
