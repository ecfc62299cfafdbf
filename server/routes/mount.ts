import type { RequestHandler, Router } from 'express';
import { authorize } from '../middleware/auth';
import { ROUTE_ACCESS, type RouteKey } from './route-access';

type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';

/** Mounts a route with the access declared for it in ROUTE_ACCESS, checked before anything else. */
export function mount(router: Router, key: RouteKey, ...handlers: RequestHandler[]): void {
  const [verb, path] = key.split(' ') as [string, string];
  const method = verb.toLowerCase() as Method;
  router[method](path, authorize(ROUTE_ACCESS[key]), ...handlers);
}
