import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/common';
import { setSellPriceRuleBodySchema } from '../../shared/schemas/sell-price';
import { createSupplierBodySchema, suppliersQuerySchema, updateSupplierBodySchema } from '../../shared/schemas/suppliers';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { presentSellPriceRule, presentSellPriceRules } from '../presenters/sell-price.presenter';
import { presentSupplierResponse, presentSuppliers } from '../presenters/supplier.presenter';
import { listRules, setRule } from '../services/sell-price.service';
import { createSupplier, listSuppliers, updateSupplier } from '../services/suppliers.service';
import { mount } from './mount';

/** Suppliers: list (with the date of the last committed price list), add, edit, archive; the sell-price rule. */
export function supplierRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;

  mount(r, 'GET /api/suppliers', async (req, res) => {
    const { archived } = parseQuery(suppliersQuerySchema, req);
    res.json(presentSuppliers(await listSuppliers(ds, archived === 'include')));
  });

  mount(r, 'POST /api/suppliers', async (req, res) => {
    const body = parseBody(createSupplierBodySchema, req);
    res.status(201).json(presentSupplierResponse(await createSupplier(ds, currentUser(req).id, body)));
  });

  mount(r, 'PATCH /api/suppliers/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const body = parseBody(updateSupplierBodySchema, req);
    res.json(presentSupplierResponse(await updateSupplier(ds, currentUser(req).id, id, body)));
  });

  mount(r, 'GET /api/sell-price-rules', async (_req, res) => {
    res.json(presentSellPriceRules(await listRules(ds)));
  });

  mount(r, 'PUT /api/sell-price-rules/:id', async (req, res) => {
    const { id: brandId } = parseParams(idParamSchema, req);
    const body = parseBody(setSellPriceRuleBodySchema, req);
    res.json(presentSellPriceRule(await setRule(ds, currentUser(req).id, brandId, body)));
  });

  return r;
}
