/**
 * Bearer-key check, answered like Meilisearch: no header 401, wrong key 403. `/health` stays
 * public, as it is on a real server.
 */
import type { RequestHandler } from 'express';
import { MeiliError } from './meili-error';

export function requireApiKey(apiKey: string | undefined): RequestHandler {
  return (req, _res, next) => {
    if (!apiKey || req.path === '/health') {
      next();
      return;
    }
    const header = req.get('authorization');
    if (!header) {
      next(
        new MeiliError(
          401,
          'missing_authorization_header',
          'The Authorization header is missing. It must use the bearer authorization method.',
          'auth',
        ),
      );
      return;
    }
    const match = /^Bearer\s+(.+)$/i.exec(header);
    if (!match || match[1] !== apiKey) {
      next(new MeiliError(403, 'invalid_api_key', 'The provided API key is invalid.', 'auth'));
      return;
    }
    next();
  };
}
