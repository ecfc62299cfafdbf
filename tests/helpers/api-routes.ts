import type { Express } from 'express';

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/** Every API route the app actually mounts ("GET /api/parts/:id"), read from Express's own router. */
export function mountedRoutes(app: Express): string[] {
  const out: string[] = [];
  const walk = (stack: Layer[]) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const [m, on] of Object.entries(layer.route.methods))
          if (on && m !== '_all') out.push(`${m.toUpperCase()} ${layer.route.path}`);
      } else if (layer.handle?.stack) walk(layer.handle.stack);
    }
  };
  walk((app.locals.apiRouter as { stack: Layer[] }).stack);
  return out;
}
