import { createHash } from 'node:crypto';
import type pg from 'pg';
import type { RateLimiterPostgres } from 'rate-limiter-flexible';
import type { Env } from '../config/env';
import { AppError } from '../errors';
import { isOverLimit, postgresLimiter } from '../middleware/rate-limit';

const REFUSED = 'Too many failed sign-ins from here. Wait a few minutes and try again.';

/**
 * Failed sign-ins counted per (e-mail, client address) and per client address, never per e-mail
 * alone: wrong passwords typed elsewhere cannot lock the owner out of their own account.
 * rate-limiter-flexible's login recipe, with the attempt charged before the password is checked
 * so that parallel guesses cannot all slip in under the limit; a right password gives it back.
 */
export class SignInLimits {
  private readonly perAccountAndClient: RateLimiterPostgres;
  private readonly perClient: RateLimiterPostgres;

  constructor(pool: pg.Pool, env: Env) {
    const durationSeconds = Math.round(env.LOGIN_WINDOW_MINUTES * 60);
    this.perAccountAndClient = postgresLimiter(pool, {
      prefix: 'sign-in:account-client',
      points: env.LOGIN_MAX_PER_ACCOUNT_AND_CLIENT,
      durationSeconds,
    });
    this.perClient = postgresLimiter(pool, { prefix: 'sign-in:client', points: env.LOGIN_MAX_PER_CLIENT, durationSeconds });
  }

  /** Charges one attempt to both counters; a 429 with Retry-After when either is spent. */
  async attempt(email: string, client: string): Promise<void> {
    const outcomes = await Promise.allSettled([
      this.perAccountAndClient.consume(accountClientKey(email, client)),
      this.perClient.consume(client),
    ]);
    let waitMs = 0;
    for (const outcome of outcomes) {
      if (outcome.status === 'fulfilled') continue;
      if (!isOverLimit(outcome.reason)) throw outcome.reason;
      waitMs = Math.max(waitMs, outcome.reason.msBeforeNext);
    }
    if (waitMs > 0) throw AppError.rateLimited(REFUSED, waitMs);
  }

  /** A right password: this account's failures from this address are forgotten, and the address gets its attempt back. */
  async succeeded(email: string, client: string): Promise<void> {
    await Promise.all([this.perAccountAndClient.delete(accountClientKey(email, client)), this.perClient.reward(client, 1)]);
  }
}

/** Hashed: the key column is bounded, and the table need not hold e-mail addresses. */
function accountClientKey(email: string, client: string): string {
  return createHash('sha256').update(`${email.trim().toLowerCase()}\n${client}`).digest('hex');
}
