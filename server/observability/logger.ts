import { pino, type DestinationStream, type Logger } from 'pino';
import type { Env } from '../config/env';

export type { Logger } from 'pino';

/**
 * Never written to a log line, whoever logs a request or its headers: the session cookie, an API
 * key or the CSRF token would let a reader of the logs act as the caller.
 */
export const REDACTED_PATHS = [
  'req.headers.authorization',
  'req.headers.cookie',
  'req.headers["x-csrf-token"]',
  'res.headers["set-cookie"]',
  'headers.authorization',
  'headers.cookie',
];

/**
 * The process's one logger: JSON lines on stdout (or `destination`, for a test). Written
 * asynchronously in 4 KB batches, as pino advises for a busy server: a line per request written
 * synchronously cost the event loop more than the search it logged. `closeDeps` flushes it.
 */
export function createLogger(env: Pick<Env, 'LOG_LEVEL' | 'NODE_ENV'>, destination?: DestinationStream): Logger {
  const level = env.LOG_LEVEL ?? (env.NODE_ENV === 'test' ? 'warn' : 'info');
  const out = destination ?? pino.destination({ dest: 1, sync: false, minLength: 4096 });
  return pino({ level, base: { pid: process.pid }, redact: { paths: REDACTED_PATHS, censor: '[redacted]' } }, out);
}
