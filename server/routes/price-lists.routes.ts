import { Router } from 'express';
import type { AppDeps } from '../deps';

/** Supplier price-list intake: upload, preview, commit, discard, history (being built). */
export function priceListRoutes(_deps: AppDeps): Router {
  return Router();
}
