import type { Router } from 'express';

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/** Every route a router (or an app's own router) actually mounts, as `METHOD /path`, read from Express's stack. */
export function mountedRoutes(router: Router): string[] {
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
