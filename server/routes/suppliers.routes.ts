import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/common';
import { createSupplierBodySchema, updateSupplierBodySchema } from '../../shared/schemas/suppliers';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams } from '../middleware/validate';
import { presentSupplierResponse, presentSuppliers } from '../presenters/supplier.presenter';
import { createSupplier, listSuppliers, updateSupplier } from '../services/suppliers.service';
import { mount } from './mount';

/** Suppliers: list (with the date of the last committed price list), add, edit. */
export function supplierRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;

  mount(r, 'GET /api/suppliers', async (_req, res) => {
    res.json(presentSuppliers(await listSuppliers(ds)));
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

  return r;
}
