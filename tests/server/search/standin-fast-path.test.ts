/**
 * The stand-in answers `POST /indexes/:uid/search` without Express (search-fast-path.ts); these
 * tests send the same requests to the Express app alone and to the server with the fast path, over
 * one shared state, and expect the same status, content type and body (processingTimeMs aside).
 */
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { searchFastPath } from '../../../server/search-standin/search-fast-path';
import { createStandinApp } from '../../../server/search-standin/standin-app';
import { createStandinState } from '../../../server/search-standin/standin-state';

const API_KEY = 'fast-path-key';
const state = createStandinState();
const app = createStandinApp(state, API_KEY);
const fast = searchFastPath(state, API_KEY);
let expressOnly: Server;
let withFastPath: Server;
let expressUrl = '';
let fastUrl = '';

function listen(server: Server): Promise<string> {
  return new Promise((resolve) =>
    server.listen(0, '127.0.0.1', () => resolve(`http://127.0.0.1:${(server.address() as AddressInfo).port}`)),
  );
}

const auth = { authorization: `Bearer ${API_KEY}` };

beforeAll(async () => {
  expressOnly = createServer(app);
  withFastPath = createServer((req, res) => {
    if (!fast(req, res)) app(req, res);
  });
  expressUrl = await listen(expressOnly);
  fastUrl = await listen(withFastPath);
  const post = (path: string, body: unknown) =>
    fetch(`${expressUrl}${path}`, { method: 'POST', headers: { ...auth, 'content-type': 'application/json' }, body: JSON.stringify(body) });
  await post('/indexes', { uid: 'parts', primaryKey: 'id' });
  await fetch(`${expressUrl}/indexes/parts/settings`, {
    method: 'PATCH',
    headers: { ...auth, 'content-type': 'application/json' },
    body: JSON.stringify({ filterableAttributes: ['brand', 'kind', 'current', 'heat'], sortableAttributes: ['heat'] }),
  });
  await post('/indexes/parts/documents', [
    { id: 'a', number: 'BLP000101', brand: 'Orvane', kind: 'plug', current: true, heat: 6, text: 'Iridium spark plug' },
    { id: 'b', number: 'BLP000103', brand: 'orvane', kind: 'plug', current: true, heat: 7, text: 'Platinum spark plug' },
    { id: 'c', number: 'BLC000102', brand: 'Telrix', kind: 'coil', current: false, heat: null, text: 'Pencil coil' },
    { id: 'd', number: 'BLC000104', brand: 'Telrix', kind: 'coil', current: true, heat: null, text: 'Coil pack' },
  ]);
  await state.tasks.whenIdle();
});

afterAll(async () => {
  for (const server of [expressOnly, withFastPath]) {
    server.closeAllConnections();
    await new Promise((resolve) => server.close(resolve));
  }
});

interface Answer {
  status: number;
  type: string | null;
  body: unknown;
}

async function ask(base: string, path: string, init: RequestInit): Promise<Answer> {
  const response = await fetch(`${base}${path}`, init);
  const text = await response.text();
  let body: unknown = text;
  try {
    body = JSON.parse(text);
  } catch {
    // left as text
  }
  if (body && typeof body === 'object' && 'processingTimeMs' in body) delete (body as { processingTimeMs?: unknown }).processingTimeMs;
  return { status: response.status, type: response.headers.get('content-type'), body };
}

const json = (body: unknown, headers: Record<string, string> = auth): RequestInit => ({
  method: 'POST',
  headers: { ...headers, 'content-type': 'application/json' },
  body: typeof body === 'string' ? body : JSON.stringify(body),
});

const CASES: Array<[string, string, RequestInit]> = [
  [
    'text with filter and facets',
    '/indexes/parts/search',
    json({ q: 'spark plug', filter: ['current = true'], facets: ['kind', 'brand'], limit: 20 }),
  ],
  ['number with a typo', '/indexes/parts/search', json({ q: 'BLP000102', filter: 'current = true' })],
  ['placeholder with facets and stats', '/indexes/parts/search', json({ q: '', facets: ['brand', 'heat'], limit: 1 })],
  ['sort and pagination', '/indexes/parts/search', json({ q: '', sort: ['heat:desc'], page: 1, hitsPerPage: 2 })],
  ['highlighting', '/indexes/parts/search', json({ q: 'coil', attributesToHighlight: ['*'], showRankingScore: true })],
  ['empty body', '/indexes/parts/search', json('')],
  ['malformed body', '/indexes/parts/search', json('{"q": ')],
  ['bad filter', '/indexes/parts/search', json({ q: '', filter: 'text = x' })],
  ['bad limit', '/indexes/parts/search', json({ q: '', limit: -1 })],
  ['missing index', '/indexes/nothing/search', json({ q: 'x' })],
  ['no key', '/indexes/parts/search', json({ q: 'x' }, {})],
  ['wrong key', '/indexes/parts/search', json({ q: 'x' }, { authorization: 'Bearer nope' })],
  ['query string', '/indexes/parts/search?x=1', json({ q: 'plug' })],
];

describe('search fast path', () => {
  for (const [name, path, init] of CASES) {
    it(`answers like the Express route: ${name}`, async () => {
      const viaExpress = await ask(expressUrl, path, init);
      const viaFastPath = await ask(fastUrl, path, init);
      expect(viaFastPath).toEqual(viaExpress);
    });
  }

  it('finds what it should', async () => {
    const answer = await ask(fastUrl, '/indexes/parts/search', json({ q: 'spark plug', filter: ['current = true'], facets: ['brand'] }));
    expect(answer.status).toBe(200);
    expect(answer.body).toMatchObject({ estimatedTotalHits: 2, facetDistribution: { brand: { Orvane: 2 } } });
  });
});
