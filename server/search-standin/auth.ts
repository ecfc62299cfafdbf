/**
 * Bearer-key check, answered like Meilisearch: no header 401, wrong key 403. `/health` stays
 * public, as it is on a real server.
 */
import type { RequestHandler } from 'express';
import { MeiliError } from './meili-error';

/** The error to answer a request with, or null when its Authorization header lets it through. */
export function authorizationError(apiKey: string | undefined, path: string, header: string | undefined): MeiliError | null {
  if (!apiKey || path === '/health') return null;
  if (!header) {
    return new MeiliError(
      401,
      'missing_authorization_header',
      'The Authorization header is missing. It must use the bearer authorization method.',
      'auth',
    );
  }
  const match = /^Bearer\s+(.+)$/i.exec(header);
  if (!match || match[1] !== apiKey) return new MeiliError(403, 'invalid_api_key', 'The provided API key is invalid.', 'auth');
  return null;
}

export function requireApiKey(apiKey: string | undefined): RequestHandler {
  return (req, _res, next) => {
    const error = authorizationError(apiKey, req.path, req.get('authorization'));
    if (error) next(error);
    else next();
  };
}
