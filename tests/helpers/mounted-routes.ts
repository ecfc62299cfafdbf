import type { Express, Router } from 'express';

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/** Every route a router actually mounts, as `METHOD /path`, read from Express's own stack. */
export function routesOf(router: Router): string[] {
  const out: string[] = [];
  const walk = (stack: Layer[]) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const [m, on] of Object.entries(layer.route.methods))
          if (on && m !== '_all') out.push(`${m.toUpperCase()} ${layer.route.path}`);
      } else if (layer.handle?.stack) walk(layer.handle.stack);
    }
  };
  walk((router as unknown as { stack: Layer[] }).stack);
  return out;
}

/** Every API route the app mounts ("GET /api/parts/:id"): the router `createApp` keeps in its locals. */
export const mountedRoutes = (app: Express): string[] => routesOf(app.locals.apiRouter as Router);

/** Every route of the whole app, the API's and those outside it (probes, metrics, the docs page). */
export const allRoutes = (app: Express): string[] => routesOf((app as unknown as { router: Router }).router);
