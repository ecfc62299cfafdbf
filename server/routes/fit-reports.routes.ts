import { Router } from 'express';
import { z } from 'zod';
import { idParamSchema } from '../../shared/schemas/auth';
import { emailFitReportBodySchema, fitReportBodySchema } from '../../shared/schemas/compat';
import { appUrl } from '../config/env';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams } from '../middleware/validate';
import { FitReportService } from '../services/compat/fit-reports.service';
import { getSettings } from '../services/settings.service';
import { mount } from './mount';

const tokenParamSchema = z.object({ token: z.string().min(20).max(100) });

export function fitReportRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;
  const reports = () => new FitReportService(ds, appUrl(deps.env));

  mount(r, 'POST /api/fit-reports', async (req, res) => {
    const body = parseBody(fitReportBodySchema, req);
    res.status(201).json({ fitReport: await reports().create(currentUser(req), body, (await getSettings(ds)).compat) });
  });

  mount(r, 'GET /api/fit-reports', async (req, res) => {
    res.json({ fitReports: await reports().list(currentUser(req)) });
  });

  mount(r, 'GET /api/fit-reports/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    res.json({ fitReport: await reports().get(currentUser(req), id) });
  });

  mount(r, 'POST /api/fit-reports/:id/email', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const { to } = parseBody(emailFitReportBodySchema, req);
    await reports().email(currentUser(req), id, to, deps.jobs);
    res.status(202).json({ sent: true });
  });

  // The share link: read-only, no sign-in, found only by its unguessable token.
  mount(r, 'GET /api/shared/fit-reports/:token', async (req, res) => {
    const { token } = parseParams(tokenParamSchema, req);
    res.json({ fitReport: await reports().getShared(token) });
  });

  return r;
}
