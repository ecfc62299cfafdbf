import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type { RequestHandler } from 'express';
import type { AppDeps } from '../deps';

declare module 'express-session' {
  interface SessionData {
    /** Set when a CSRF token is issued, so the visitor's session is kept and the token stays bound to it. */
    csrfIssuedAt?: number;
  }
}

export const SESSION_COOKIE = 'arcwise.sid';
const EIGHT_HOURS_MS = 8 * 3600 * 1000;

/** Sessions in PostgreSQL (connect-pg-simple), the table made by the Foundation migration. */
export function sessionMiddleware({ env, pool }: AppDeps): RequestHandler {
  const PgStore = connectPgSimple(session);
  return session({
    name: SESSION_COOKIE,
    // No touch on every request: a session lasts one shift from sign-in, and a search costs no session write.
    store: new PgStore({ pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60, disableTouch: true }),
    secret: env.SESSION_SECRET,
    resave: false,
    saveUninitialized: false,
    rolling: false,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: env.COOKIE_SECURE,
      maxAge: EIGHT_HOURS_MS,
    },
  });
}
