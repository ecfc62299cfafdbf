import type { Request, RequestHandler, Response } from 'express';
import { errorBodySchema } from '../../shared/schemas/error';
import { fieldIssues, fieldSentence } from '../../shared/validation/field-issues';
import { ROUTE_ACCESS, type RouteKey } from '../routes/route-access';
import { answerFor } from './document';

/** An answer that is not what the document says the route answers. */
export interface ResponseMismatch {
  request: string;
  route: string;
  status: number;
  problems: string[];
}

const recorded: ResponseMismatch[] = [];

/** The mismatches recorded since the last call, and forgets them: the API tests expect none after each test. */
export function takeResponseMismatches(): ResponseMismatch[] {
  return recorded.splice(0);
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Fields sent that the schema does not list (zod drops them when it parses). */
function undocumentedFields(sent: unknown, kept: unknown, path: string, out: string[]): void {
  if (Array.isArray(sent) && Array.isArray(kept)) {
    sent.forEach((item, i) => undocumentedFields(item, kept[i], `${path}${i}.`, out));
  } else if (isRecord(sent) && isRecord(kept)) {
    for (const key of Object.keys(sent)) {
      if (key in kept) undocumentedFields(sent[key], kept[key], `${path}${key}.`, out);
      else out.push(`${path}${key} is sent but not documented`);
    }
  }
}

function routeKeyOf(req: Request): RouteKey | undefined {
  const path = (req.route as { path?: unknown } | undefined)?.path;
  const key = `${req.method} ${String(path)}`;
  return typeof path === 'string' && key in ROUTE_ACCESS ? (key as RouteKey) : undefined;
}

function problemsOf(req: Request, res: Response, body: unknown): string[] {
  const key = routeKeyOf(req);
  const status = res.statusCode;
  // Outside the routes (the docs page's files), only an error has a shape to keep: the error shape.
  if (!key && status < 400) return [];
  const answer = key ? answerFor(key, status) : errorBodySchema;
  if (answer === undefined) return [`status ${status} is not documented for ${key}`];
  if (body === undefined) return answer === 'empty' || answer === 'csv' ? [] : ['no JSON body, but one is documented'];
  if (answer === 'empty' || answer === 'csv') return [`a JSON body, but the document says ${answer}`];
  // What the client receives: the body as JSON, not the objects it was made from.
  const sent: unknown = JSON.parse(JSON.stringify(body));
  const parsed = answer.safeParse(sent);
  if (!parsed.success) return fieldIssues(parsed.error, '(body)').map(fieldSentence);
  const extra: string[] = [];
  undocumentedFields(sent, parsed.data, '', extra);
  return extra;
}

/**
 * Test mode only: every answer of the API is held against the schema the document gives its
 * route and status. A mismatch is recorded (and logged), not thrown, so the request still
 * completes; tests/helpers/response-contract.ts fails the test that caused it.
 */
export function checkResponses(): RequestHandler {
  return (req, res, next) => {
    let checked = false;
    const record = (body: unknown) => {
      checked = true;
      const problems = problemsOf(req, res, body);
      if (!problems.length) return;
      const mismatch = {
        request: `${req.method} ${req.originalUrl}`,
        route: routeKeyOf(req) ?? '(no route)',
        status: res.statusCode,
        problems,
      };
      recorded.push(mismatch);
      console.error('[arcwise] answer does not match the API document:', mismatch);
    };
    const json = res.json.bind(res);
    res.json = (body: unknown) => {
      record(body);
      return json(body);
    };
    // Answers without JSON (204, a CSV file) are checked by their status when they finish.
    res.on('finish', () => {
      if (!checked) record(undefined);
    });
    next();
  };
}
