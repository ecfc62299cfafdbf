import type { Request } from 'express';
import { ipKeyGenerator } from 'express-rate-limit';
import type pg from 'pg';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';

/** The table made by the RateLimits migration; every limiter keeps its counters there under its own prefix. */
const RATE_LIMIT_TABLE = 'rate_limit';

export interface LimitOptions {
  /** Names the counters in the shared table; one per kind of limit. */
  prefix: string;
  points: number;
  durationSeconds: number;
}

/**
 * A rate-limiter-flexible counter kept in PostgreSQL on the app's pool, so several app servers
 * share it. The table comes from a migration, hence tableCreated.
 */
export function postgresLimiter(pool: pg.Pool, opts: LimitOptions): RateLimiterPostgres {
  return new RateLimiterPostgres({
    storeClient: pool,
    storeType: 'pool',
    tableName: RATE_LIMIT_TABLE,
    tableCreated: true,
    keyPrefix: opts.prefix,
    points: opts.points,
    duration: opts.durationSeconds,
  });
}

/** A consume() that went over the limit rejects with the counter's state, not an Error. */
export function isOverLimit(reason: unknown): reason is RateLimiterRes {
  return reason instanceof RateLimiterRes;
}

/**
 * The client's address as Express reads it: the socket's, or the proxy's X-Forwarded-For entry
 * only when TRUST_PROXY is set (so the header cannot be forged around a limit otherwise). IPv6
 * addresses count per /56 network, as one household or office holds a whole one.
 */
export function clientAddress(req: Request): string {
  return ipKeyGenerator(req.ip ?? req.socket.remoteAddress ?? 'unknown', 56);
}
