import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/common';
import {
  locationBodySchema,
  transferRequestBodySchema,
  transferStepBodySchema,
  transfersQuerySchema,
  updateLocationBodySchema,
} from '../../shared/schemas/locations';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { presentLocationResponse, presentLocations, presentTransferResponse, presentTransfers } from '../presenters/location.presenter';
import { createLocation, editLocation, getLocations } from '../services/locations.service';
import { listTransfers, requestTransfer, stepTransfer } from '../services/transfers.service';
import { mount } from './mount';

/** The chain's stores (the admin keeps them) and the transfers of parts between them. */
export function locationsRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;

  mount(r, 'GET /api/locations', async (_req, res) => {
    res.json(presentLocations(await getLocations(ds)));
  });

  mount(r, 'POST /api/locations', async (req, res) => {
    const body = parseBody(locationBodySchema, req);
    res.status(201).json(presentLocationResponse(await createLocation(ds, currentUser(req).id, body)));
  });

  mount(r, 'PATCH /api/locations/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const body = parseBody(updateLocationBodySchema, req);
    res.json(presentLocationResponse(await editLocation(ds, currentUser(req).id, id, body)));
  });

  mount(r, 'GET /api/transfers', async (req, res) => {
    const user = currentUser(req);
    res.json(presentTransfers(await listTransfers(ds, user, parseQuery(transfersQuerySchema, req)), user));
  });

  mount(r, 'POST /api/transfers', async (req, res) => {
    const user = currentUser(req);
    const body = parseBody(transferRequestBodySchema, req);
    res.status(201).json(presentTransferResponse(await requestTransfer(ds, user, body), user));
  });

  mount(r, 'POST /api/transfers/:id/steps', async (req, res) => {
    const user = currentUser(req);
    const { id } = parseParams(idParamSchema, req);
    const body = parseBody(transferStepBodySchema, req);
    res.json(presentTransferResponse(await stepTransfer(ds, deps.jobs, user, id, body), user));
  });

  return r;
}
