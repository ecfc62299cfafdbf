/**
 * `POST /indexes/:uid/search` as the SDK sends it (a small JSON body), answered without going
 * through Express: once the engine answered a query in a millisecond or less, Express's router,
 * body parser and response helpers were a large share of each request, and at 20 concurrent
 * clients that share decides the queueing. The answer is byte for byte what the Express route and
 * its error handler give; anything unusual — another content type or charset, a compressed or
 * large body, a percent-encoded uid, a trailing slash — is left to the Express app.
 */
import type { IncomingMessage, ServerResponse } from 'node:http';
import { authorizationError } from './auth';
import { toMeiliError, MeiliError } from './meili-error';
import { runSearch } from './search-engine';
import { readSearchRequest } from './search-request';
import type { StandinState } from './standin-state';

const SEARCH_PATH = /^\/indexes\/([a-zA-Z0-9_-]{1,400})\/search$/;
/** Bigger bodies go through Express and its size limit. */
const MAX_BODY_BYTES = 1 << 20;
const JSON_TYPE = /^application\/(?:json|[^\s;/]*\+json)\s*(?:;\s*charset\s*=\s*"?utf-8"?\s*)?$/i;

function send(res: ServerResponse, status: number, body: unknown): void {
  const text = JSON.stringify(body);
  res.statusCode = status;
  res.setHeader('Content-Type', 'application/json; charset=utf-8');
  res.setHeader('Content-Length', Buffer.byteLength(text));
  res.end(text);
}

function sendError(res: ServerResponse, error: unknown): void {
  const meiliError = toMeiliError(error);
  if (meiliError.status >= 500) console.error('[search-standin]', error);
  send(res, meiliError.status, meiliError.toBody());
}

/** Returns a handler that answers the request and returns true, or returns false to pass it on. */
export function searchFastPath(state: StandinState, apiKey: string | undefined): (req: IncomingMessage, res: ServerResponse) => boolean {
  return (req, res) => {
    if (req.method !== 'POST') return false;
    const url = req.url ?? '';
    const query = url.indexOf('?');
    const match = SEARCH_PATH.exec(query >= 0 ? url.slice(0, query) : url);
    if (!match) return false;
    const type = req.headers['content-type'];
    const encoding = req.headers['content-encoding'];
    const length = Number(req.headers['content-length']);
    if (!type || !JSON_TYPE.test(type) || (encoding && encoding.toLowerCase() !== 'identity')) return false;
    if (!Number.isInteger(length) || length > MAX_BODY_BYTES || req.headers['transfer-encoding'] !== undefined) return false;

    const denied = authorizationError(apiKey, match[0], req.headers.authorization);
    const chunks: Buffer[] = [];
    req.on('data', (chunk: Buffer) => chunks.push(chunk));
    req.on('error', (error) => {
      if (!res.headersSent) sendError(res, error);
    });
    req.on('end', () => {
      if (denied) {
        send(res, denied.status, denied.toBody());
        return;
      }
      let body: unknown;
      try {
        const text = Buffer.concat(chunks)
          .toString('utf8')
          .replace(/^\uFEFF/, '');
        body = text.length === 0 ? {} : JSON.parse(text);
      } catch (error) {
        const message = error instanceof Error ? error.message : 'Invalid request body.';
        send(res, 400, new MeiliError(400, 'malformed_payload', `The json payload provided is malformed. ${message}`).toBody());
        return;
      }
      try {
        send(res, 200, runSearch(state.catalog.get(match[1] as string), readSearchRequest(body)));
      } catch (error) {
        sendError(res, error);
      }
    });
    return true;
  };
}
