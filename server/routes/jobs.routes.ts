import { Router } from 'express';
import { jobIdParamSchema } from '../../shared/schemas/jobs';
import type { AppDeps } from '../deps';
import { parseParams } from '../middleware/validate';
import { presentJobs, presentRetriedJob } from '../presenters/job.presenter';
import { listJobs, retryJob } from '../services/jobs.service';
import { mount } from './mount';

/** The follow-up jobs that need an admin's eye: retrying or failed, and a retry by hand. */
export function jobsRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;

  mount(r, 'GET /api/jobs', async (_req, res) => {
    res.json(presentJobs(await listJobs(ds)));
  });

  mount(r, 'POST /api/jobs/:id/retry', async (req, res) => {
    const { id } = parseParams(jobIdParamSchema, req);
    res.json(presentRetriedJob(await retryJob(ds, deps.jobs, id)));
  });

  return r;
}
