import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { networkInterfaces } from 'node:os';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isLoopback, metricsAccess } from '../../../server/middleware/metrics-access';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { signInAt } from '../../helpers/http-agent';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

/** One sample's value from Prometheus's text format, by metric name and exact label set. */
function sample(text: string, name: string, labels: Record<string, string>): number | null {
  const want = Object.entries(labels)
    .map(([k, v]) => `${k}="${v}"`)
    .sort()
    .join(',');
  for (const line of text.split('\n')) {
    const m = /^([a-zA-Z_:][\w:]*)\{([^}]*)\} (\S+)$/.exec(line);
    if (!m || m[1] !== name) continue;
    if (m[2]!.split(',').sort().join(',') === want) return Number(m[3]);
  }
  return null;
}

/** This machine's first address that is not loopback: a caller from there is "another machine" to the socket. */
function externalAddress(): string {
  const found = Object.values(networkInterfaces())
    .flat()
    .find((a) => a && a.family === 'IPv4' && !a.internal);
  if (!found) throw new Error('this test needs a network interface besides loopback to call the server from');
  return found.address;
}

describe('who may read /metrics', () => {
  it('loopback is 127.0.0.0/8 and ::1, also IPv4-mapped; nothing else', () => {
    for (const a of ['127.0.0.1', '127.3.4.5', '::1', '::ffff:127.0.0.1']) expect(isLoopback(a), a).toBe(true);
    for (const a of ['192.0.2.2', '::ffff:192.0.2.2', '10.0.0.1', '128.0.0.1', '::2', 'fe80::1', '', undefined])
      expect(isLoopback(a), String(a)).toBe(false);
  });

  it('a caller elsewhere needs an admin session: anonymous 401, another role 403', () => {
    const user = (role: 'admin' | 'clerk') => ({ id: 'u', email: 'e@example.test', name: 'n', role, shopId: null, homeLocationId: null });
    expect(metricsAccess('127.0.0.1', undefined)).toBe('allowed');
    expect(metricsAccess('192.0.2.9', undefined)).toBe(401);
    expect(metricsAccess('192.0.2.9', user('clerk'))).toBe(403);
    expect(metricsAccess('192.0.2.9', user('admin'))).toBe('allowed');
  });
});

describe('/metrics', () => {
  let t: TestApp;
  beforeAll(async () => {
    // Jobs are only queued here, so the queue's depth can be watched growing.
    t = await createTestApp({ JOB_WORKERS: '0', TRUST_PROXY: '1' });
  });
  afterAll(() => t.close());

  it('from loopback: process, HTTP latency by route pattern, job queue depth and pool metrics', async () => {
    const buyer = await makeUser(t.deps.dataSource, 'buyer');
    const { agent, token } = await signIn(t.app, buyer.email, TEST_PASSWORD);
    const before = (await request(t.app).get('/metrics').expect(200)).text;
    const queuedBefore = sample(before, 'arcwise_job_queue_jobs', { queue: 'search.refresh', state: 'created' });
    expect(queuedBefore).not.toBeNull();

    const created = await agent
      .post('/api/parts')
      .set('x-csrf-token', token)
      .send({ brand: 'Quaywell', partNumber: `QW-IC M${Date.now() % 1_000_000}`, kind: 'coil', description: 'Metrics test coil' })
      .expect(201);
    const partId = (created.body as { part: { id: string } }).part.id;
    await agent.get(`/api/parts/${partId}`).expect(200);
    await agent.get(`/api/parts/${partId}`).expect(200);

    const res = await request(t.app).get('/metrics').expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/plain; version=0\.0\.4/);
    const text = res.text;
    for (const name of ['process_cpu_user_seconds_total', 'nodejs_eventloop_lag_seconds', 'http_request_duration_seconds_bucket'])
      expect(text).toContain(`${name}`);
    const partReads = { method: 'GET', route: '/api/parts/:id', status_class: '2xx' };
    const countBefore = sample(before, 'http_request_duration_seconds_count', partReads) ?? 0;
    expect(sample(text, 'http_request_duration_seconds_count', partReads)).toBe(countBefore + 2);
    expect(sample(text, 'http_request_duration_seconds_count', { method: 'POST', route: '/api/parts', status_class: '2xx' })).toBe(1);
    // The route's pattern, never the URL: no label holds the part's id.
    expect(text).not.toContain(partId);
    // The create queued one search refresh, waiting in the queue (no workers here).
    expect(sample(text, 'arcwise_job_queue_jobs', { queue: 'search.refresh', state: 'created' })).toBe(queuedBefore! + 1);
    expect(sample(text, 'arcwise_job_queue_jobs', { queue: 'mail.send', state: 'failed' })).toEqual(expect.any(Number));
    for (const pool of ['app', 'typeorm', 'jobs']) {
      const total = sample(text, 'arcwise_db_pool_connections', { pool });
      expect(total, pool).toBeGreaterThanOrEqual(0);
      expect(sample(text, 'arcwise_db_pool_idle', { pool })!, pool).toBeLessThanOrEqual(total!);
      // Nothing else runs here (no workers): no query waits for a connection, the scrape's own included.
      expect(sample(text, 'arcwise_db_pool_waiting', { pool }), pool).toBe(0);
    }
    // TypeORM's pool ran the part reads: it has a connection open.
    expect(sample(text, 'arcwise_db_pool_connections', { pool: 'typeorm' })).toBeGreaterThan(0);
  });

  describe('from another address (this machine’s network interface, not loopback)', () => {
    let server: Server;
    let base: string;
    beforeAll(async () => {
      server = t.app.listen(0, '0.0.0.0');
      await new Promise((r) => server.once('listening', r));
      base = `http://${externalAddress()}:${(server.address() as AddressInfo).port}`;
    });
    afterAll(() => new Promise<void>((r) => server.close(() => r())));

    it('refuses an anonymous caller, also one claiming loopback in X-Forwarded-For', async () => {
      const res = await request(base).get('/metrics').expect(401);
      expect(res.body.error.code).toBe('unauthorized');
      await request(base).get('/metrics').set('X-Forwarded-For', '127.0.0.1').expect(401);
      // The same app answers the same request from loopback.
      await request(t.app).get('/metrics').expect(200);
    });

    it('refuses a signed-in clerk (403) and lets an admin read them', async () => {
      const clerk = await makeUser(t.deps.dataSource, 'clerk');
      const admin = await makeUser(t.deps.dataSource, 'admin');
      const asClerk = await signInAt(base, clerk.email, TEST_PASSWORD);
      expect((await asClerk.agent.get('/metrics').expect(403)).body.error.code).toBe('forbidden');
      const asAdmin = await signInAt(base, admin.email, TEST_PASSWORD);
      expect((await asAdmin.agent.get('/metrics').expect(200)).text).toContain('http_request_duration_seconds');
    });
  });
});
