import request from 'supertest';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { errorBodySchema } from '../../../shared/schemas/error';
import { livenessSchema, readinessSchema } from '../../../shared/schemas/ops';
import { startSearchStandin } from '../../../server/search-standin/server';
import { startTcpProxy, type TcpProxy } from '../../helpers/tcp-proxy';
import { createTestApp, type TestApp } from '../../helpers/test-app';

/** The test database's URL, through the proxy's port instead of PostgreSQL's own. */
function throughProxy(databaseUrl: string, proxy: TcpProxy): string {
  const url = new URL(databaseUrl);
  url.host = `127.0.0.1:${proxy.port}`;
  return url.toString();
}

describe('health probes', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('/healthz answers 200 without a session, a CSRF token or a dependency', async () => {
    const res = await request(t.app).get('/healthz').expect(200);
    expect(livenessSchema.parse(res.body)).toEqual({ status: 'ok' });
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('/readyz answers 200 with the database and the search service checked', async () => {
    const res = await request(t.app).get('/readyz').expect(200);
    expect(readinessSchema.parse(res.body)).toEqual({ status: 'ready', checks: { database: 'ok', search: 'ok' } });
  });

  it('/readyz answers 503 in the one error shape once the server is stopping', async () => {
    t.deps.lifecycle.stopping = true;
    try {
      const res = await request(t.app).get('/readyz').expect(503);
      expect(errorBodySchema.parse(res.body).error).toMatchObject({ code: 'unavailable', details: { stopping: true } });
      // Liveness is not readiness: the process still serves the requests it has.
      await request(t.app).get('/healthz').expect(200);
    } finally {
      t.deps.lifecycle.stopping = false;
    }
  });
});

describe('/readyz with a dependency gone', () => {
  it('names the search service when it does not answer, and the database stays ok', async () => {
    // A real stand-in, stopped: its port now refuses connections.
    const standin = await startSearchStandin({ port: 0 });
    await standin.close();
    // Quiet: the app logs the failed checks, as it should.
    const t = await createTestApp({ MEILI_HOST: standin.url, LOG_LEVEL: 'silent' });
    try {
      const res = await request(t.app).get('/readyz').expect(503);
      const { error } = errorBodySchema.parse(res.body);
      expect(error.code).toBe('unavailable');
      expect(error.message).toBe('Not ready: search unreachable.');
      expect(error.details).toMatchObject({ database: 'ok', search: expect.not.stringMatching(/^ok$/) });
    } finally {
      await t.close();
    }
  });

  it('names the database when PostgreSQL is cut off, and is ready again when it is back', async () => {
    const pgUrl = new URL(inject('databaseUrl'));
    const proxy = await startTcpProxy(Number(pgUrl.port));
    const t = await createTestApp({ DATABASE_URL: throughProxy(inject('databaseUrl'), proxy), LOG_LEVEL: 'silent' });
    try {
      await request(t.app).get('/readyz').expect(200);
      await proxy.down();
      const res = await request(t.app).get('/readyz').expect(503);
      const { error } = errorBodySchema.parse(res.body);
      expect(error.message).toBe('Not ready: database unreachable.');
      expect(error.details).toMatchObject({ database: expect.not.stringMatching(/^ok$/), search: 'ok' });
      await proxy.up();
      await request(t.app).get('/readyz').expect(200);
    } finally {
      await t.close();
      await proxy.close();
    }
  });
});
