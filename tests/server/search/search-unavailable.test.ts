/**
 * A search service that is down or refuses the key is a logged error and a 503 from /api/search
 * with the API's error shape, never an empty list. A stand-in of the test's own, started with a
 * master key (Meilisearch answers 403 invalid_api_key to a wrong key) and then stopped.
 */
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { startSearchStandin, type RunningSearchStandin } from '../../../server/search-standin/server';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

describe('GET /api/search when the search service is unavailable', () => {
  let standin: RunningSearchStandin;
  const apps: TestApp[] = [];

  beforeAll(async () => {
    standin = await startSearchStandin({ port: 0, apiKey: 'the-right-key' });
    const t = await createTestApp({ MEILI_HOST: standin.url, MEILI_API_KEY: 'the-right-key' });
    apps.push(t);
    await t.deps.search.rebuild(t.deps.dataSource);
  });
  afterEach(() => vi.restoreAllMocks());
  afterAll(async () => {
    for (const a of apps) await a.close();
    await standin.close();
  });

  async function searchWith(host: string, apiKey: string) {
    const t = await createTestApp({ MEILI_HOST: host, MEILI_API_KEY: apiKey });
    apps.push(t);
    const u = await makeUser(t.deps.dataSource, 'clerk');
    const { agent } = await signIn(t.app, u.email, TEST_PASSWORD);
    const logged = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const res = await agent.get('/api/search').query({ q: 'canister' });
    return { res, logged: logged.mock.calls.map((c) => c.map(String).join(' ')) };
  }

  it('answers 503 search_unavailable when the service refuses the key, and logs it', async () => {
    const { res, logged } = await searchWith(standin.url, 'a-wrong-key');
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ error: { code: 'search_unavailable', message: expect.any(String) } });
    expect(logged.some((line) => line.includes('search service unavailable') && line.includes('403'))).toBe(true);
  });

  it('answers 503 search_unavailable when the service is stopped, and logs it', async () => {
    const { res: ok } = await searchWith(standin.url, 'the-right-key');
    expect(ok.status).toBe(200);
    expect(ok.body.hits.length).toBeGreaterThan(0);
    const url = standin.url;
    await standin.close();
    const { res, logged } = await searchWith(url, 'the-right-key');
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('search_unavailable');
    expect(logged.some((line) => line.includes('cannot be reached'))).toBe(true);
  });
});
