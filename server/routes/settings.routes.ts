import { Router } from 'express';
import { updateSettingsBodySchema } from '../../shared/schemas/settings';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody } from '../middleware/validate';
import { presentSettings } from '../presenters/settings.presenter';
import { getSettings, saveSettings } from '../services/settings.service';
import { mount } from './mount';

export function settingsRoutes(deps: AppDeps): Router {
  const r = Router();
  mount(r, 'GET /api/settings', async (_req, res) => {
    res.json(presentSettings(await getSettings(deps.dataSource)));
  });
  mount(r, 'PUT /api/settings', async (req, res) => {
    const { settings } = parseBody(updateSettingsBodySchema, req);
    res.json(presentSettings(await saveSettings(deps.dataSource, currentUser(req).id, settings)));
  });
  return r;
}
