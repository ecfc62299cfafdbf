import { Router } from 'express';
import { z } from 'zod';
import {
  createBrandBodySchema,
  createInterchangeBodySchema,
  createPartBodySchema,
  updatePartBodySchema,
  vehicleQuerySchemas,
} from '../../shared/schemas/catalog';
import { idParamSchema } from '../../shared/schemas/auth';
import { searchQuerySchema } from '../../shared/schemas/search';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { CatalogEditService } from '../services/catalog/catalog-edit.service';
import { getEngineDetail, getPartDetail } from '../services/catalog/part-detail.service';
import { listEngines, listMakes, listModels, listYears } from '../services/catalog/vehicles.service';
import { searchParts } from '../services/search.service';
import { getSettings } from '../services/settings.service';
import { mount } from './mount';

const partQuerySchema = z.object({ engineId: z.string().uuid().optional() });

export function catalogRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;
  const edits = new CatalogEditService(ds, deps.jobs);

  mount(r, 'GET /api/vehicles/years', async (_req, res) => {
    res.json({ years: await listYears(ds) });
  });
  mount(r, 'GET /api/vehicles/makes', async (req, res) => {
    const q = parseQuery(vehicleQuerySchemas.makes, req);
    res.json({ makes: await listMakes(ds, q.year) });
  });
  mount(r, 'GET /api/vehicles/models', async (req, res) => {
    const q = parseQuery(vehicleQuerySchemas.models, req);
    res.json({ models: await listModels(ds, q.year, q.make) });
  });
  mount(r, 'GET /api/vehicles/engines', async (req, res) => {
    const q = parseQuery(vehicleQuerySchemas.engines, req);
    res.json({ engines: await listEngines(ds, q.year, q.make, q.model) });
  });

  mount(r, 'GET /api/engines/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    res.json(await getEngineDetail(ds, id, currentUser(req).role));
  });

  mount(r, 'GET /api/search', async (req, res) => {
    const result = await searchParts(deps.search, parseQuery(searchQuerySchema, req), ds, (await getSettings(ds)).compat);
    // A shop's technician sees in stock yes/no, not the store's count.
    if (currentUser(req).role === 'technician') result.hits = result.hits.map(({ onHand: _onHand, ...hit }) => hit);
    res.json(result);
  });

  mount(r, 'GET /api/parts/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const { engineId } = parseQuery(partQuerySchema, req);
    res.json(await getPartDetail(ds, id, currentUser(req).role, (await getSettings(ds)).compat, engineId));
  });

  mount(r, 'GET /api/brands', async (_req, res) => {
    const rows = (await ds.query(
      `SELECT b.id, b.name, b.ours, b.heat_code_note,
              coalesce(json_agg(json_build_object('code', h.code, 'heatStep', h.heat_step) ORDER BY h.heat_step) FILTER (WHERE h.code IS NOT NULL), '[]') AS heat_codes
         FROM brand b LEFT JOIN brand_heat_code h ON h.brand_id = b.id GROUP BY b.id ORDER BY b.ours DESC, b.name`,
    )) as { id: string; name: string; ours: boolean; heat_code_note: string | null; heat_codes: { code: string; heatStep: number }[] }[];
    res.json({
      brands: rows.map((b) => ({ id: b.id, name: b.name, ours: b.ours, heatCodeNote: b.heat_code_note, heatCodes: b.heat_codes })),
    });
  });

  mount(r, 'POST /api/brands', async (req, res) => {
    const body = parseBody(createBrandBodySchema, req);
    res.status(201).json({ brand: await edits.createBrand(currentUser(req).id, body) });
  });

  mount(r, 'POST /api/parts', async (req, res) => {
    const body = parseBody(createPartBodySchema, req);
    const user = currentUser(req);
    const id = await edits.createPart(user.id, body);
    res.status(201).json(await getPartDetail(ds, id, user.role, (await getSettings(ds)).compat));
  });

  mount(r, 'PATCH /api/parts/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const body = parseBody(updatePartBodySchema, req);
    const user = currentUser(req);
    await edits.updatePart(user.id, id, body);
    res.json(await getPartDetail(ds, id, user.role, (await getSettings(ds)).compat));
  });

  mount(r, 'POST /api/interchange', async (req, res) => {
    const body = parseBody(createInterchangeBodySchema, req);
    const id = await edits.createInterchange(currentUser(req).id, body);
    res.status(201).json({ interchange: { id, ...body } });
  });

  return r;
}
