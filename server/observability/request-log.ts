import { randomUUID } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { pinoHttp } from 'pino-http';
import type { Logger } from './logger';
import { routePattern } from './route-pattern';

export const REQUEST_ID_HEADER = 'X-Request-Id';
/** An id a proxy or client sent is kept when it is short and plain; anything else could forge log lines. */
const INCOMING_ID = /^[A-Za-z0-9._:@-]{1,128}$/;
/** Load balancers ask these every few seconds: no line per probe (a failing /readyz logs its reason itself). */
const QUIET_PATHS = new Set(['/healthz', '/readyz', '/metrics']);
/** A route whose path carries a secret (an invitation's or a shared report's token) is logged by its pattern. */
const SECRET_PARAM = /:\w*token\b/i;

/** The caller's id from X-Request-Id, or a new one; echoed on the response either way. */
export function requestId(req: Request, res: Response): string {
  const incoming = req.headers['x-request-id'];
  const id = typeof incoming === 'string' && INCOMING_ID.test(incoming) ? incoming : randomUUID();
  res.setHeader(REQUEST_ID_HEADER, id);
  return id;
}

/** Who made the call, once authentication has run: a person (id, role) or an API key (its name). */
function caller(req: Request): object {
  const apiKey: unknown = Reflect.get(req, 'apiKey');
  if (typeof apiKey === 'object' && apiKey !== null && 'name' in apiKey && typeof apiKey.name === 'string') {
    return { apiKey: apiKey.name };
  }
  return req.user ? { user: { id: req.user.id, role: req.user.role } } : {};
}

/** What the completion line says about the request, worked out when it ends (the route is known then). */
function completion(req: Request, res: Response, val: { responseTime: number }): object {
  const route = routePattern(req);
  // Flat fields of our own: pino-http's serializers own the `req` and `res` keys.
  return {
    method: req.method,
    url: SECRET_PARAM.test(route) ? route : req.originalUrl,
    route,
    status: res.statusCode,
    ms: val.responseTime,
    ...caller(req),
  };
}

/**
 * One JSON line per request (pino-http): method, url, route, status, ms, caller and the request id,
 * which every line logged through `req.log` carries too. Headers are never logged: the line names
 * what it needs, and the logger's redact list covers anything that logs headers anyway.
 */
export function requestLog(logger: Logger): RequestHandler {
  return pinoHttp<Request, Response>({
    logger,
    genReqId: requestId,
    quietReqLogger: true,
    quietResLogger: true,
    customAttributeKeys: { reqId: 'reqId' },
    autoLogging: { ignore: (req) => QUIET_PATHS.has(req.path) },
    customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? 'error' : 'info'),
    customSuccessMessage: () => 'request completed',
    customErrorMessage: () => 'request failed',
    customSuccessObject: (req, res, val: { responseTime: number }) => completion(req, res, val),
    customErrorObject: (req, res, _err, val: { responseTime: number }) => completion(req, res, val),
  });
}
