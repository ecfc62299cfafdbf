import { Router } from 'express';
import { alternatesQuerySchema } from '../../shared/schemas/alternates';
import { benchBodySchema } from '../../shared/schemas/bench';
import { idParamSchema } from '../../shared/schemas/common';
import { coilCompareBodySchema, plugCompareBodySchema } from '../../shared/schemas/compat';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { presentAlternates } from '../presenters/alternates.presenter';
import { presentBenchResult } from '../presenters/bench.presenter';
import { presentCoilComparison, presentPlugComparison } from '../presenters/compat.presenter';
import { engineAlternates } from '../services/compat/alternates.service';
import { runBenchTest } from '../services/compat/bench.service';
import { compareCoilRequest, comparePlugRequest } from '../services/compat/compare.service';
import { hereFor } from '../services/locations.service';
import { mount } from './mount';

export function compatRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;

  mount(r, 'POST /api/compat/coil', async (req, res) => {
    const body = parseBody(coilCompareBodySchema, req);
    res.json(presentCoilComparison(await compareCoilRequest(ds, body)));
  });

  mount(r, 'POST /api/compat/plug', async (req, res) => {
    const body = parseBody(plugCompareBodySchema, req);
    res.json(presentPlugComparison(await comparePlugRequest(ds, body)));
  });

  mount(r, 'GET /api/engines/:id/alternates', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const query = parseQuery(alternatesQuerySchema, req);
    const ranked = await engineAlternates(ds, id, query, hereFor(req.user, query.location));
    res.json(presentAlternates(ranked, currentUser(req).role));
  });

  mount(r, 'POST /api/bench/coil', async (req, res) => {
    const body = parseBody(benchBodySchema, req);
    const { result, coil } = await runBenchTest(ds, body);
    res.json(presentBenchResult(result, coil));
  });

  return r;
}
