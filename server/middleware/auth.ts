import type { RequestHandler } from 'express';
import type { Role } from '../../shared/roles';
import type { User } from '../../shared/schemas/auth';
import { AppError } from '../errors';
import type { Access } from '../routes/route-access';

/** Enforces a route's declared access before anything else runs. */
export function authorize(access: Access): RequestHandler {
  return (req, _res, next) => {
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
