import { Router } from 'express';
import { z } from 'zod';
import { settingsSchema } from '../../shared/schemas/settings';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody } from '../middleware/validate';
import { getSettings, saveSettings } from '../services/settings.service';
import { mount } from './mount';

export function settingsRoutes(deps: AppDeps): Router {
  const r = Router();
  mount(r, 'GET /api/settings', async (_req, res) => {
    res.json({ settings: await getSettings(deps.dataSource) });
  });
  mount(r, 'PUT /api/settings', async (req, res) => {
    const { settings } = parseBody(z.object({ settings: settingsSchema }), req);
    res.json({ settings: await saveSettings(deps.dataSource, currentUser(req).id, settings) });
  });
  return r;
}
