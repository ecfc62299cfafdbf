import type { RequestHandler } from 'express';
import type { Role } from '../../shared/roles';
import type { User } from '../../shared/schemas/auth';
import { AppError } from '../errors';
import { scopeCovers } from '../../shared/schemas/api-keys';
import { keyScopeOf, peopleAccess, type RouteRule } from '../routes/route-access';

/** Enforces a route's declared access before anything else runs: a key by its scope, a person by role. */
export function authorize(rule: RouteRule): RequestHandler {
  const access = peopleAccess(rule);
  const keyScope = keyScopeOf(rule);
  return (req, _res, next) => {
    if (req.apiKey) {
      if (keyScope === null) return next(AppError.forbidden('An API key may not call this route.'));
      if (!scopeCovers(req.apiKey.scope, keyScope)) return next(AppError.forbidden(`This route needs a ${keyScope} key.`));
      return next();
    }
    if (access === 'public') return next();
    const user = req.user;
    if (!user) return next(AppError.unauthorized());
    if (access !== 'signed-in' && !access.includes(user.role)) return next(AppError.forbidden());
    next();
  };
}

export function currentUser(req: { user?: User }): User {
  if (!req.user) throw AppError.unauthorized();
  return req.user;
}

export function hasRole(user: User, ...roles: Role[]): boolean {
  return roles.includes(user.role);
}
