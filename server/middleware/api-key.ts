import type { RequestHandler } from 'express';
import type { Role } from '../../shared/roles';
import type { ApiKeyScope } from '../../shared/schemas/api-keys';
import type { AppDeps } from '../deps';
import type { ApiKeyEntity } from '../entities';
import { AppError } from '../errors';
import { findLiveKey, recordKeyCall } from '../services/api-keys.service';
import { isOverLimit, postgresLimiter } from './rate-limit';

/**
 * Cost and margin follow the people's rule: a read key is shown what a clerk is shown, a write
 * key what a buyer is. Which routes a key may call is the route table's business, not the role's.
 */
const ACTS_AS: Record<ApiKeyScope, Role> = { read: 'clerk', write: 'buyer' };

const BEARER = /^Bearer[ \t]+([^\s]+)[ \t]*$/i;

/** The key stands in for a person in the handlers; changes it makes are recorded under the admin who made it. */
function keyActor(key: ApiKeyEntity): Express.User {
  return { id: key.createdBy, email: '', name: `API key “${key.name}”`, role: ACTS_AS[key.scope], shopId: null, homeLocationId: null };
}

/**
 * Authorization: Bearer <key>. A call that sends one is judged by the key alone: the session
 * middleware does not run for it (see app.ts), so a bad key is a 401 and never falls back to a
 * cookie. Each call is rate limited per key in PostgreSQL and written to the audit log.
 */
export function apiKeyAuth(deps: AppDeps): RequestHandler {
  const limiter = postgresLimiter(deps.pool, { prefix: 'api-key', points: deps.env.API_KEY_MAX_PER_MINUTE, durationSeconds: 60 });
  return async (req, res, next) => {
    const header = req.get('authorization');
    if (header === undefined) return next();
    const presented = BEARER.exec(header)?.[1];
    if (presented === undefined) throw AppError.unauthorized('Send the API key as “Authorization: Bearer <key>”.');
    const key = await findLiveKey(deps.dataSource, presented);
    if (!key) throw AppError.unauthorized('This API key is unknown or was revoked.');
    req.apiKey = { id: key.id, name: key.name, scope: key.scope };
    req.user = keyActor(key);
    res.on('finish', () => {
      recordKeyCall(deps.dataSource, key, { method: req.method, path: req.originalUrl, status: res.statusCode }).catch((err: unknown) => {
        console.error(`[arcwise] could not audit a call of API key ${key.id}:`, err);
      });
    });
    try {
      await limiter.consume(key.id);
    } catch (reason) {
      if (isOverLimit(reason))
        throw AppError.rateLimited('Too many calls with this API key: slow down and retry later.', reason.msBeforeNext);
      throw reason;
    }
    next();
  };
}

/** Runs a people-only middleware (session, passport) for every call that did not come with an API key. */
export function forPeople(middleware: RequestHandler): RequestHandler {
  return (req, res, next) => (req.apiKey ? next() : middleware(req, res, next));
}
