import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/common';
import {
  emailFitReportBodySchema,
  fitReportBodySchema,
  fitReportsQuerySchema,
  shareTokenParamSchema,
  updateFitReportBodySchema,
} from '../../shared/schemas/fit-reports';
import { appUrl } from '../config/env';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { presentEmailSent, presentFitReportResponse, presentFitReports, presentSharedFitReport } from '../presenters/fit-report.presenter';
import { FitReportService } from '../services/compat/fit-reports.service';
import { mount } from './mount';

export function fitReportRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;
  // Read per request: the address is known only once the server listens (tests set it then).
  const base = () => appUrl(deps.env);
  const reports = () => new FitReportService(ds, base());

  mount(r, 'POST /api/fit-reports', async (req, res) => {
    const body = parseBody(fitReportBodySchema, req);
    res.status(201).json(presentFitReportResponse(await reports().create(currentUser(req), body), base()));
  });

  mount(r, 'GET /api/fit-reports', async (req, res) => {
    const query = parseQuery(fitReportsQuerySchema, req);
    res.json(presentFitReports(await reports().list(currentUser(req), query)));
  });

  mount(r, 'PATCH /api/fit-reports/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const { archived } = parseBody(updateFitReportBodySchema, req);
    res.json(presentFitReportResponse(await reports().setArchived(currentUser(req), id, archived), base()));
  });

  mount(r, 'GET /api/fit-reports/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    res.json(presentFitReportResponse(await reports().get(currentUser(req), id), base()));
  });

  mount(r, 'POST /api/fit-reports/:id/email', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const { to } = parseBody(emailFitReportBodySchema, req);
    await reports().email(currentUser(req), id, to, deps.jobs);
    res.status(202).json(presentEmailSent());
  });

  // The share link: read-only, no sign-in, found only by its unguessable token.
  mount(r, 'GET /api/shared/fit-reports/:token', async (req, res) => {
    const { token } = parseParams(shareTokenParamSchema, req);
    res.json(presentSharedFitReport(await reports().getShared(token), base()));
  });

  return r;
}
