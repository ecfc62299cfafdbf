import { Router } from 'express';
import type { AppDeps } from '../deps';

/** Suppliers: list, add, edit (being built). */
export function supplierRoutes(_deps: AppDeps): Router {
  return Router();
}
