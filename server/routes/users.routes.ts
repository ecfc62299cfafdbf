import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/common';
import { inviteBodySchema, updateUserBodySchema } from '../../shared/schemas/users';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams } from '../middleware/validate';
import { presentOutbox } from '../presenters/outbox.presenter';
import { presentInvited, presentShops, presentTeam, presentTeamMemberResponse } from '../presenters/user.presenter';
import { readOutbox } from '../services/outbox.service';
import { inviteUser, listShops, listUsers, updateUser } from '../services/users.service';
import { mount } from './mount';

export function usersRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;

  mount(r, 'GET /api/users', async (_req, res) => {
    res.json(presentTeam(await listUsers(ds)));
  });

  mount(r, 'POST /api/users/invite', async (req, res) => {
    const body = parseBody(inviteBodySchema, req);
    const { user, expiresAt } = await inviteUser(ds, deps.jobs, currentUser(req).id, body);
    res.status(201).json(presentInvited(user, expiresAt));
  });

  mount(r, 'PATCH /api/users/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const body = parseBody(updateUserBodySchema, req);
    res.json(presentTeamMemberResponse(await updateUser(ds, currentUser(req).id, id, body)));
  });

  mount(r, 'GET /api/shops', async (_req, res) => {
    res.json(presentShops(await listShops(ds)));
  });

  mount(r, 'GET /api/outbox', async (_req, res) => {
    res.json(presentOutbox(await readOutbox(deps.env.MAIL_CATCHER_URL)));
  });

  return r;
}
