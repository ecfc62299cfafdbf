import { Router } from 'express';
import { idParamSchema, inviteBodySchema, updateUserBodySchema } from '../../shared/schemas/auth';
import type { AppDeps } from '../deps';
import { currentUser } from '../middleware/auth';
import { parseBody, parseParams } from '../middleware/validate';
import { presentTeamMember } from '../presenters/user.presenter';
import { readOutbox } from '../services/outbox.service';
import { inviteUser, listShops, listUsers, updateUser } from '../services/users.service';
import { mount } from './mount';

export function usersRoutes(deps: AppDeps): Router {
  const r = Router();
  const ds = deps.dataSource;

  mount(r, 'GET /api/users', async (_req, res) => {
    res.json({ users: (await listUsers(ds)).map(presentTeamMember) });
  });

  mount(r, 'POST /api/users/invite', async (req, res) => {
    const body = parseBody(inviteBodySchema, req);
    const { user, expiresAt } = await inviteUser(ds, deps.jobs, currentUser(req).id, body);
    res.status(201).json({ user: presentTeamMember(user), expiresAt: expiresAt.toISOString() });
  });

  mount(r, 'PATCH /api/users/:id', async (req, res) => {
    const { id } = parseParams(idParamSchema, req);
    const body = parseBody(updateUserBodySchema, req);
    res.json({ user: presentTeamMember(await updateUser(ds, currentUser(req).id, id, body)) });
  });

  mount(r, 'GET /api/shops', async (_req, res) => {
    res.json({ shops: (await listShops(ds)).map((s) => ({ id: s.id, name: s.name })) });
  });

  mount(r, 'GET /api/outbox', async (_req, res) => {
    res.json({ messages: await readOutbox(deps.env.MAIL_CATCHER_URL) });
  });

  return r;
}
