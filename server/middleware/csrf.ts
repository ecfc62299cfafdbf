import { doubleCsrf } from 'csrf-csrf';
import type { ErrorRequestHandler } from 'express';
import type { Env } from '../config/env';
import { AppError } from '../errors';

export const CSRF_COOKIE = 'arcwise.csrf';
export const CSRF_HEADER = 'x-csrf-token';

/**
 * Double-submit CSRF tokens (csrf-csrf): the token is HMAC-signed with the server secret over the
 * session id and sent back both as a cookie and in the x-csrf-token header, so a token taken
 * from one session is refused in any other. Sign-in regenerates the session and sign-out ends
 * it: the client fetches a new token after both. A call with an API key carries no cookie to
 * forge, so it needs no token (the key middleware has set req.apiKey only for such calls).
 */
export function csrfProtection(env: Env) {
  const { doubleCsrfProtection, generateCsrfToken } = doubleCsrf({
    getSecret: () => env.SESSION_SECRET,
    getSessionIdentifier: (req) => req.session?.id ?? '',
    skipCsrfProtection: (req) => req.apiKey !== undefined,
    cookieName: CSRF_COOKIE,
    cookieOptions: { httpOnly: true, sameSite: 'lax', secure: env.COOKIE_SECURE, path: '/' },
    getCsrfTokenFromRequest: (req) => req.get(CSRF_HEADER),
    errorConfig: { statusCode: 403, code: 'csrf_invalid', message: 'Missing or invalid CSRF token.' },
  });
  return { doubleCsrfProtection, generateCsrfToken };
}

/** Turns the package's error into the API's error shape. */
export const csrfErrorToAppError: ErrorRequestHandler = (err: unknown, _req, _res, next) => {
  if (typeof err === 'object' && err !== null && (err as { code?: unknown }).code === 'csrf_invalid') {
    next(new AppError(403, 'csrf_invalid', 'Missing or invalid CSRF token: reload the page and try again.'));
    return;
  }
  next(err);
};
