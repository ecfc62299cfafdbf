import { Router } from 'express';
import type { PassportStatic } from 'passport';
import { acceptInviteBodySchema, inviteTokenParamSchema, loginBodySchema } from '../../shared/schemas/auth';
import type { AppDeps } from '../deps';
import { AppError } from '../errors';
import { currentUser } from '../middleware/auth';
import type { csrfProtection } from '../middleware/csrf';
import { clientAddress } from '../middleware/rate-limit';
import { SESSION_COOKIE } from '../middleware/session';
import { parseBody, parseParams } from '../middleware/validate';
import { presentCsrfToken, presentHealth } from '../presenters/system.presenter';
import { presentInvitation, presentUser, presentUserResponse } from '../presenters/user.presenter';
import { SignInLimits } from '../services/sign-in-limits';
import { acceptInvite, describeInvitation } from '../services/users.service';
import { mount } from './mount';

const BAD_SIGN_IN = 'Wrong e-mail or password, or the account is disabled.';

export function authRoutes(deps: AppDeps, csrf: ReturnType<typeof csrfProtection>, passport: PassportStatic): Router {
  const r = Router();
  const limits = new SignInLimits(deps.pool, deps.env);

  mount(r, 'GET /api/health', (_req, res) => {
    res.json(presentHealth());
  });

  mount(r, 'GET /api/auth/csrf', (req, res) => {
    // The token is bound to the session id: a visitor not signed in gets a session kept for it.
    req.session.csrfIssuedAt ??= Date.now();
    res.json(presentCsrfToken(csrf.generateCsrfToken(req, res, { overwrite: false })));
  });

  mount(r, 'POST /api/auth/login', async (req, res, next) => {
    const { email } = parseBody(loginBodySchema, req);
    const client = clientAddress(req);
    await limits.attempt(email, client);
    passport.authenticate('local', (err: unknown, user: Express.User | false) => {
      if (err) return next(err);
      if (!user) return next(AppError.unauthorized(BAD_SIGN_IN));
      limits.succeeded(email, client).then(() => {
        // passport regenerates the session on logIn, so a fixed session id cannot be reused.
        req.logIn(user, (loginErr) => {
          if (loginErr) return next(loginErr);
          res.json(presentUserResponse(user));
        });
      }, next);
    })(req, res, next);
  });

  mount(r, 'POST /api/auth/logout', (req, res, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy((destroyErr) => {
        if (destroyErr) return next(destroyErr);
        res.clearCookie(SESSION_COOKIE);
        res.status(204).end();
      });
    });
  });

  mount(r, 'GET /api/auth/me', (req, res) => {
    res.json(presentUserResponse(currentUser(req)));
  });

  mount(r, 'GET /api/auth/invite/:token', async (req, res) => {
    const { token } = parseParams(inviteTokenParamSchema, req);
    res.json(presentInvitation(await describeInvitation(deps.dataSource, token)));
  });

  mount(r, 'POST /api/auth/accept-invite', async (req, res) => {
    const body = parseBody(acceptInviteBodySchema, req);
    const user = await acceptInvite(deps.dataSource, body);
    res.json(presentUserResponse(presentUser(user)));
  });

  return r;
}
