import { OpenAPIRegistry, OpenApiGeneratorV31, type ResponseConfig, type RouteConfig } from '@asteasolutions/zod-to-openapi';
import { z } from 'zod';
import { errorBodySchema } from '../../shared/schemas/error';
import { CSRF_HEADER } from '../middleware/csrf';
import { SESSION_COOKIE } from '../middleware/session';
import { keyScopeOf, peopleAccess, ROUTE_ACCESS, type Access, type RouteKey } from '../routes/route-access';
import { ROUTE_DOCS, TAGS, type Answer, type RouteDoc } from './route-docs';

const DOCS: Record<RouteKey, RouteDoc> = ROUTE_DOCS;

const ERROR_WORDS: Record<number, string> = {
  400: 'The request is not valid: `details` lists each field by its path, with what is wrong in plain words.',
  401: 'Not signed in (or the session ended).',
  403: 'The role may not do this, or the CSRF token is missing or wrong.',
  404: 'Not found.',
  409: 'In conflict with what is stored (`details.constraint` names a unique index).',
  413: 'Too large.',
  415: 'Not a text file.',
  429: 'Too many attempts: wait and try again.',
  500: 'Our failure; it is logged. No stack is sent.',
  503: 'A service the route needs did not answer.',
};

/** Every status a route can answer with the error shape: implied by its inputs and access, plus its own. */
export function errorStatuses(key: RouteKey): number[] {
  const doc = DOCS[key];
  const access: Access = peopleAccess(ROUTE_ACCESS[key]);
  const implied = new Set<number>([500, ...(doc.errors ?? [])]);
  if (doc.params || doc.query || doc.body || doc.form) implied.add(400);
  if (access !== 'public' || keyScopeOf(ROUTE_ACCESS[key])) implied.add(401);
  if (keyScopeOf(ROUTE_ACCESS[key])) implied.add(429);
  // A role list refuses the other roles; every state change refuses a missing CSRF token; a route
  // that names no key scope refuses every API key.
  if (Array.isArray(access) || !key.startsWith('GET ') || !keyScopeOf(ROUTE_ACCESS[key])) implied.add(403);
  if (doc.params) implied.add(404);
  return [...implied].sort((a, b) => a - b);
}

/** The schema a route's answer with this status must match: its own on success, the error shape otherwise. */
export function answerFor(key: RouteKey, status: number): Answer | undefined {
  const ok = (DOCS[key].responses as Partial<Record<number, Answer>>)[status];
  if (ok !== undefined) return ok;
  return errorStatuses(key).includes(status) ? errorBodySchema : undefined;
}

/** "/api/parts/:id" → "/api/parts/{id}" */
export const openApiPath = (expressPath: string) => expressPath.replace(/:(\w+)/g, '{$1}');

function accessWords(key: RouteKey): string {
  const access = peopleAccess(ROUTE_ACCESS[key]);
  const scope = keyScopeOf(ROUTE_ACCESS[key]);
  const people =
    access === 'public' ? 'Public: no sign-in.' : access === 'signed-in' ? 'Any signed-in user.' : `Roles: ${access.join(', ')}.`;
  return scope ? `${people} API keys of scope ${scope}${scope === 'read' ? ' or write' : ''}.` : people;
}

function successContent(answer: Answer): ResponseConfig {
  if (answer === 'empty') return { description: 'Done; no body.' };
  if (answer === 'csv') return { description: 'A CSV file.', content: { 'text/csv': { schema: { type: 'string' } } } };
  return { description: 'OK', content: { 'application/json': { schema: answer } } };
}

function routeConfig(key: RouteKey, errorBody: z.ZodType): RouteConfig {
  const doc = DOCS[key];
  const access: Access = peopleAccess(ROUTE_ACCESS[key]);
  const scope = keyScopeOf(ROUTE_ACCESS[key]);
  const [verb, path] = key.split(' ') as [string, string];
  const method = verb.toLowerCase() as RouteConfig['method'];
  const responses: RouteConfig['responses'] = {};
  for (const [status, answer] of Object.entries(doc.responses)) responses[status] = successContent(answer);
  for (const status of errorStatuses(key)) {
    responses[status] = { description: ERROR_WORDS[status] ?? 'Error.', content: { 'application/json': { schema: errorBody } } };
  }
  const request: NonNullable<RouteConfig['request']> = {};
  if (doc.params) request.params = doc.params;
  if (doc.query) request.query = doc.query;
  if (doc.body) request.body = { required: true, content: { 'application/json': { schema: doc.body } } };
  if (doc.form) {
    const file = z.string().meta({ format: 'binary', description: 'The CSV file.' });
    request.body = {
      required: true,
      content: { 'multipart/form-data': { schema: doc.form.fields.extend({ [doc.form.file]: file }) } },
    };
  }
  const session = access === 'public' ? [] : [{ session: [] as string[] }];
  const csrf = verb === 'GET' ? [] : [{ csrf: [] as string[] }];
  return {
    method,
    path: openApiPath(path),
    operationId: key,
    tags: [doc.tag],
    summary: doc.summary,
    description: [doc.description, accessWords(key)].filter(Boolean).join('\n\n'),
    // Either a signed-in session with, for a state change, the CSRF header; or an API key alone.
    security: [
      ...(session.length || csrf.length ? [{ ...session[0], ...csrf[0] }] : access === 'public' && scope ? [{}] : []),
      ...(scope ? [{ apiKey: [] as string[] }] : []),
    ],
    request,
    responses,
  };
}

/** The OpenAPI 3.1 document of the whole API, generated from ROUTE_DOCS and ROUTE_ACCESS. */
export function buildOpenApiDocument(): ReturnType<OpenApiGeneratorV31['generateDocument']> {
  const registry = new OpenAPIRegistry();
  registry.registerComponent('securitySchemes', 'session', {
    type: 'apiKey',
    in: 'cookie',
    name: SESSION_COOKIE,
    description: 'The session cookie set by `POST /api/auth/login`.',
  });
  registry.registerComponent('securitySchemes', 'csrf', {
    type: 'apiKey',
    in: 'header',
    name: CSRF_HEADER,
    description: 'The token from `GET /api/auth/csrf`, on every state-changing request.',
  });

  registry.registerComponent('securitySchemes', 'apiKey', {
    type: 'http',
    scheme: 'bearer',
    description: 'An API key made by an admin (`POST /api/api-keys`), as `Authorization: Bearer …`: no cookie and no CSRF token.',
  });

  for (const key of Object.keys(DOCS) as RouteKey[]) registry.registerPath(routeConfig(key, errorBodySchema));
  return new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: '3.1.0',
    info: {
      title: 'Arcwise API',
      version: '1',
      description:
        "The ignition-parts desk's HTTP API: search, vehicles and engines, parts, compatibility, fit reports, suppliers and price lists. Errors are always `{ error: { code, message, details? } }`.",
    },
    tags: TAGS.map((name) => ({ name })),
  });
}

let cached: ReturnType<typeof buildOpenApiDocument> | undefined;

/** Built once per process: the schemas do not change while it runs. */
export function openApiDocument(): ReturnType<typeof buildOpenApiDocument> {
  cached ??= buildOpenApiDocument();
  return cached;
}
