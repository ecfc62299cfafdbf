import rateLimit, { type Options } from 'express-rate-limit';
import type { RequestHandler } from 'express';
import type { Env } from '../config/env';
import { AppError } from '../errors';

/** Sign-in limits: failed attempts per account and per address, in a sliding window. */
export function loginRateLimits(env: Env): RequestHandler[] {
  const windowMs = env.LOGIN_WINDOW_MINUTES * 60 * 1000;
  const refuse: Options['handler'] = (_req, _res, next) =>
    next(new AppError(429, 'rate_limited', 'Too many sign-in attempts. Wait a few minutes and try again.'));
  const perAddress = rateLimit({
    windowMs,
    limit: env.LOGIN_MAX_PER_ADDRESS,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: refuse,
  });
  const perAccount = rateLimit({
    windowMs,
    limit: env.LOGIN_MAX_PER_ACCOUNT,
    skipSuccessfulRequests: true,
    standardHeaders: false,
    legacyHeaders: false,
    keyGenerator: (req) => {
      const body: unknown = req.body;
      const email = typeof body === 'object' && body !== null && 'email' in body ? String((body as { email: unknown }).email) : '';
      return `account:${email.trim().toLowerCase()}`;
    },
    handler: refuse,
  });
  return [perAddress, perAccount];
}
