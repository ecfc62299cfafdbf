import { rm } from 'node:fs/promises';
import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/common';
import {
  previewPriceListBodySchema,
  priceListChangesQuerySchema,
  priceListErrorsQuerySchema,
  priceListHistoryQuerySchema,
  uploadPriceListFieldsSchema,
} from '../../shared/schemas/price-lists';
import type { AppDeps } from '../deps';
import { AppError } from '../errors';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import {
  presentChanges,
  presentCommitted,
  presentPriceList,
  presentPriceListHistory,
  presentRowErrors,
} from '../presenters/price-list.presenter';
import { commitWithFollowUp } from '../services/price-list/commit';
import { errorsCsvFileName, writeErrorsCsv } from '../services/price-list/errors-csv';
import { discardPriceList, previewPriceList, uploadPriceList } from '../services/price-list/intake.service';
import { getPriceList, listChanges, listPriceLists, listRowErrors } from '../services/price-list/queries';
import { cleanFileName, receivePriceListUpload } from '../services/price-list/upload';
import { mount } from './mount';

/** Supplier price-list intake: upload, preview, commit, discard, history. */
export function priceListRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;

  mount(r, 'GET /api/price-lists', async (req, res) => {
    const { rows, total } = await listPriceLists(ds, parseQuery(priceListHistoryQuerySchema, req));
    res.json(presentPriceListHistory(rows, total));
  });

  // Processed inside the request; a concurrent GET /api/price-lists/:id (with the client's uploadId) shows the progress.
  mount(r, 'POST /api/price-lists', async (req, res) => {
    const settings = await receivePriceListUpload(req, res, ds);
    const file = req.file;
    try {
      const fields = parseBody(uploadPriceListFieldsSchema, req);
      if (!file) throw AppError.badRequest('file: choose a CSV file to upload', [{ field: 'file', message: 'required' }]);
      const list = await uploadPriceList(deps, {
        supplierId: fields.supplierId,
        fileName: cleanFileName(file.originalname),
        filePath: file.path,
        sizeBytes: file.size,
        mapping: fields.mapping,
        delimiter: fields.delimiter,
        id: fields.uploadId,
        actorId: currentUser(req).id,
        ...settings,
      });
      res.status(201).json(presentPriceList(list));
    } finally {
      if (file) await rm(file.path, { force: true });
    }
  });

  mount(r, 'GET /api/price-lists/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    res.json(presentPriceList(await getPriceList(ds, id)));
  });

  mount(r, 'GET /api/price-lists/:id/changes', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const { rows, total } = await listChanges(ds, id, parseQuery(priceListChangesQuerySchema, req));
    res.json(presentChanges(rows, total));
  });

  mount(r, 'GET /api/price-lists/:id/errors', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const { rows, total } = await listRowErrors(ds, id, parseQuery(priceListErrorsQuerySchema, req));
    res.json(presentRowErrors(rows, total));
  });

  mount(r, 'GET /api/price-lists/:id/errors.csv', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const list = await getPriceList(ds, id);
    res.attachment(errorsCsvFileName(list.file_name));
    await writeErrorsCsv(ds, id, res);
    res.end();
  });

  mount(r, 'POST /api/price-lists/:id/preview', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const body = parseBody(previewPriceListBodySchema, req);
    res.json(presentPriceList(await previewPriceList(deps, { id, mapping: body.mapping, delimiter: body.delimiter })));
  });

  mount(r, 'POST /api/price-lists/:id/commit', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    res.json(presentCommitted(await commitWithFollowUp(ds, deps.jobs, id, currentUser(req).id), []));
  });

  mount(r, 'POST /api/price-lists/:id/discard', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    res.json(presentPriceList(await discardPriceList(ds, id, currentUser(req).id)));
  });

  return r;
}
