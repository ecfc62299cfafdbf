import { Router } from 'express';
import { benchTest } from '../../shared/compat';
import { idParamSchema } from '../../shared/schemas/auth';
import {
  alternatesQuerySchema,
  benchBodySchema,
  CAUTIONS,
  coilCompareBodySchema,
  plugCompareBodySchema,
} from '../../shared/schemas/compat';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { engineAlternates } from '../services/compat/alternates.service';
import { asBadRequest, compareCoilRequest, comparePlugRequest } from '../services/compat/compare.service';
import { resolveCoil } from '../services/compat/resolve';
import { getSettings } from '../services/settings.service';
import { mount } from './mount';

export function compatRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;

  mount(r, 'POST /api/compat/coil', async (req, res) => {
    const body = parseBody(coilCompareBodySchema, req);
    res.json(await compareCoilRequest(ds, body, (await getSettings(ds)).compat));
  });

  mount(r, 'POST /api/compat/plug', async (req, res) => {
    const body = parseBody(plugCompareBodySchema, req);
    res.json(await comparePlugRequest(ds, body, (await getSettings(ds)).compat));
  });

  mount(r, 'GET /api/engines/:id/alternates', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const q = parseQuery(alternatesQuerySchema, req);
    const includeNoGo = q.all === '1' || q.all === 'true';
    res.json(await engineAlternates(ds, id, q.kind, includeNoGo, currentUser(req).role, (await getSettings(ds)).compat));
  });

  mount(r, 'POST /api/bench/coil', async (req, res) => {
    const body = parseBody(benchBodySchema, req);
    const coil = await resolveCoil(ds, 'partId' in body ? { partId: body.partId } : { spec: body.spec }, 'coil');
    const settings = (await getSettings(ds)).compat;
    const result = asBadRequest(() =>
      benchTest({
        primaryOhm: body.measured.primaryOhm,
        ...(body.measured.secondaryKohm !== undefined ? { secondaryKohm: body.measured.secondaryKohm } : {}),
        coilTempC: body.measured.temperatureC,
        window: coil.spec,
        settings,
      }),
    );
    res.json({ ...result, coil: { label: coil.label, partId: coil.partId }, cautions: [...CAUTIONS] });
  });

  return r;
}
