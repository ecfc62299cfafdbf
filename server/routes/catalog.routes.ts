import { Router } from 'express';
import { createBrandBodySchema } from '../../shared/schemas/brands';
import { idParamSchema } from '../../shared/schemas/common';
import { locationQuerySchema } from '../../shared/schemas/locations';
import { createInterchangeBodySchema } from '../../shared/schemas/interchange';
import { createPartBodySchema, partQuerySchema, updatePartBodySchema } from '../../shared/schemas/parts';
import { searchQuerySchema } from '../../shared/schemas/search';
import { vehicleEnginesQuerySchema, vehicleMakesQuerySchema, vehicleModelsQuerySchema } from '../../shared/schemas/vehicles';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { presentBrands, presentCreatedBrand } from '../presenters/brand.presenter';
import { presentInterchangeClaim } from '../presenters/interchange.presenter';
import { presentPartDetail } from '../presenters/part.presenter';
import { presentSearchResults } from '../presenters/search.presenter';
import { presentEngineDetail, presentMakes, presentModels, presentVehicleEngines, presentYears } from '../presenters/vehicle.presenter';
import { listBrands } from '../services/catalog/brands.service';
import { CatalogEditService } from '../services/catalog/catalog-edit.service';
import { getEngineDetail, getPartDetail } from '../services/catalog/part-detail.service';
import { listEngines, listMakes, listModels, listYears } from '../services/catalog/vehicles.service';
import { hereFor } from '../services/locations.service';
import { searchParts } from '../services/search.service';
import { mount } from './mount';

export function catalogRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;
  const edits = new CatalogEditService(ds, deps.jobs);

  mount(r, 'GET /api/vehicles/years', async (_req, res) => {
    res.json(presentYears(await listYears(ds)));
  });
  mount(r, 'GET /api/vehicles/makes', async (req, res) => {
    const q = parseQuery(vehicleMakesQuerySchema, req);
    res.json(presentMakes(await listMakes(ds, q.year)));
  });
  mount(r, 'GET /api/vehicles/models', async (req, res) => {
    const q = parseQuery(vehicleModelsQuerySchema, req);
    res.json(presentModels(await listModels(ds, q.year, q.make)));
  });
  mount(r, 'GET /api/vehicles/engines', async (req, res) => {
    const q = parseQuery(vehicleEnginesQuerySchema, req);
    res.json(presentVehicleEngines(await listEngines(ds, q.year, q.make, q.model)));
  });

  mount(r, 'GET /api/engines/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const { location } = parseQuery(locationQuerySchema, req);
    res.json(presentEngineDetail(await getEngineDetail(ds, id, hereFor(req.user, location)), currentUser(req).role));
  });

  mount(r, 'GET /api/search', async (req, res) => {
    const query = parseQuery(searchQuerySchema, req);
    const result = await searchParts(deps.search, query, ds, hereFor(req.user, query.location));
    res.json(presentSearchResults(result, currentUser(req).role));
  });

  mount(r, 'GET /api/parts/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const { engineId, location } = parseQuery(partQuerySchema, req);
    res.json(presentPartDetail(await getPartDetail(ds, id, hereFor(req.user, location), engineId), currentUser(req).role));
  });

  mount(r, 'GET /api/brands', async (_req, res) => {
    res.json(presentBrands(await listBrands(ds)));
  });

  mount(r, 'POST /api/brands', async (req, res) => {
    const body = parseBody(createBrandBodySchema, req);
    res.status(201).json(presentCreatedBrand(await edits.createBrand(currentUser(req).id, body)));
  });

  mount(r, 'POST /api/parts', async (req, res) => {
    const body = parseBody(createPartBodySchema, req);
    const user = currentUser(req);
    res.status(201).json(presentPartDetail(await edits.createPart(user.id, body, hereFor(req.user)), user.role));
  });

  mount(r, 'PATCH /api/parts/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const body = parseBody(updatePartBodySchema, req);
    const user = currentUser(req);
    res.json(presentPartDetail(await edits.updatePart(user.id, id, body, hereFor(req.user)), user.role));
  });

  mount(r, 'POST /api/interchange', async (req, res) => {
    const body = parseBody(createInterchangeBodySchema, req);
    res.status(201).json(presentInterchangeClaim(await edits.createInterchange(currentUser(req).id, body)));
  });

  return r;
}
