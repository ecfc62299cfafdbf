import { Router } from 'express';
import { apiKeyIdParamSchema, createApiKeyBodySchema } from '../../shared/schemas/api-keys';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams } from '../middleware/validate';
import { presentApiKeys, presentCreatedApiKey } from '../presenters/api-key.presenter';
import { createApiKey, listApiKeys, revokeApiKey } from '../services/api-keys.service';
import { mount } from './mount';

/** The admin's keys for the store's other systems: make one (shown once), list them, revoke one. */
export function apiKeyRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;

  mount(r, 'GET /api/api-keys', async (_req, res) => {
    res.json(presentApiKeys(await listApiKeys(ds)));
  });

  mount(r, 'POST /api/api-keys', async (req, res) => {
    const body = parseBody(createApiKeyBodySchema, req);
    const { entity, key } = await createApiKey(ds, currentUser(req).id, body);
    res.status(201).json(presentCreatedApiKey(entity, key));
  });

  mount(r, 'DELETE /api/api-keys/:id', async (req, res) => {
    const { id } = parseParams(apiKeyIdParamSchema, req);
    await revokeApiKey(ds, currentUser(req).id, id);
    res.status(204).end();
  });

  return r;
}
