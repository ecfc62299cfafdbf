import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiKeyScope, CreatedApiKey } from '../../../shared/schemas/api-keys';
import { apiKeyListSchema, createdApiKeySchema } from '../../../shared/schemas/api-keys';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, signIn, type Agent, type TestApp } from '../../helpers/test-app';

/** Every key name in a JSON document, however deep. */
function keysOf(value: unknown, out = new Set<string>()): Set<string> {
  if (Array.isArray(value)) for (const v of value) keysOf(v, out);
  else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      out.add(k);
      keysOf(v, out);
    }
  }
  return out;
}
const COST_KEYS = /cost|margin/i;
const costKeysIn = (body: unknown) => [...keysOf(body)].filter((k) => COST_KEYS.test(k));

interface AuditedCall {
  key: string;
  method: string;
  path: string;
  status: number;
}

describe('API keys for the store’s other systems', () => {
  let t: TestApp;
  let admin: { agent: Agent; token: string };
  const make = async (scope: ApiKeyScope, name = `${scope} ${randomUUID().slice(0, 8)}`): Promise<CreatedApiKey> => {
    const res = await admin.agent.post('/api/api-keys').set('x-csrf-token', admin.token).send({ name, scope });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return createdApiKeySchema.parse(res.body);
  };
  const bearer = (key: string) => ({ Authorization: `Bearer ${key}` });
  /** The audit rows of a key's calls, once `count` are there: each is written when its answer has gone out. */
  const auditedCalls = async (keyId: string, count: number): Promise<AuditedCall[]> => {
    let rows: { data: AuditedCall }[] = [];
    for (let i = 0; i < 100 && rows.length < count; i++) {
      if (i > 0) await new Promise((r) => setTimeout(r, 50));
      rows = await t.deps.dataSource.query(`SELECT data FROM audit_log WHERE action = 'api-key.call' AND entity_id = $1 ORDER BY id`, [
        keyId,
      ]);
    }
    return rows.map((r) => r.data);
  };
  /** A part with supplier prices in the demo data, so cost and margin have something to show. */
  let pricedPartId: string;

  beforeAll(async () => {
    t = await createTestApp();
    const u = await makeUser(t.deps.dataSource, 'admin');
    admin = await signIn(t.app, u.email, TEST_PASSWORD);
    const rows: { part_id: string }[] = await t.deps.dataSource.query(`SELECT part_id FROM supplier_price LIMIT 1`);
    pricedPartId = rows[0]!.part_id;
  });
  afterAll(() => t.close());

  it('an admin creates a key and sees it once: 201 { id, name, scope, key }; the list never carries it', async () => {
    const name = `Point of sale ${randomUUID().slice(0, 6)}`;
    const created = await make('read', name);
    expect(Object.keys(created).sort()).toEqual(['id', 'key', 'name', 'scope']);
    expect(created).toMatchObject({ name, scope: 'read' });
    expect(created.key.length).toBeGreaterThan(40);
    const list = await admin.agent.get('/api/api-keys').expect(200);
    const parsed = apiKeyListSchema.parse(list.body);
    const row = parsed.apiKeys.find((k) => k.id === created.id);
    expect(row).toMatchObject({ name, scope: 'read', revokedAt: null, lastUsedAt: null });
    expect(created.key.startsWith(row!.prefix)).toBe(true);
    expect(row!.prefix.length).toBeLessThan(created.key.length / 2);
    expect(JSON.stringify(list.body)).not.toContain(created.key);
    expect(JSON.stringify(list.body)).not.toMatch(/hash/i);
    // Only the SHA-256 is stored (FIPS 180-4; the hex digest of a 32-byte random key).
    const stored: { key_hash: string }[] = await t.deps.dataSource.query(`SELECT key_hash FROM api_key WHERE id = $1`, [created.id]);
    expect(stored[0]!.key_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored[0]!.key_hash).not.toContain(created.key);
    // A second live key of the same name would make the audit log ambiguous.
    const dup = await admin.agent.post('/api/api-keys').set('x-csrf-token', admin.token).send({ name: name.toUpperCase(), scope: 'write' });
    expect(dup.status).toBe(409);
  });

  it('with a read key and no cookie: search answers 200 with no cost or margin anywhere; part detail as a clerk sees it', async () => {
    const { key } = await make('read');
    const search = await request(t.app).get('/api/search').query({ q: 'QW-IC 3140' }).set(bearer(key));
    expect(search.status).toBe(200);
    expect(search.body.hits[0]).toMatchObject({ partNumber: 'QW-IC 3140' });
    expect(costKeysIn(search.body)).toEqual([]);
    expect(search.headers['set-cookie']).toBeUndefined();

    const part = await request(t.app).get(`/api/parts/${pricedPartId}`).set(bearer(key)).expect(200);
    expect(part.body.prices.length).toBeGreaterThan(0);
    expect(costKeysIn(part.body)).toEqual([]);
    // A write key is shown what a buyer is shown: the same route then has cost and margin (the control).
    const write = await make('write');
    const asBuyer = await request(t.app).get(`/api/parts/${pricedPartId}`).set(bearer(write.key)).expect(200);
    expect(costKeysIn(asBuyer.body)).toEqual(expect.arrayContaining(['costCents', 'marginPct']));
  });

  it('a read key may not change anything: POST /api/parts is a 403; nor reach team, settings or keys', async () => {
    const { key } = await make('read');
    const res = await request(t.app)
      .post('/api/parts')
      .set(bearer(key))
      .send({ brand: 'Quaywell', partNumber: `KEY-${randomUUID().slice(0, 6)}`, kind: 'coil' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    for (const path of ['/api/users', '/api/settings', '/api/api-keys']) {
      expect((await request(t.app).get(path).set(bearer(key))).status, path).toBe(403);
    }
  });

  it('a write key creates a brand with no cookie and no CSRF token; still no team, settings or keys', async () => {
    const { key } = await make('write');
    const name = `Keyed Brand ${randomUUID().slice(0, 6)}`;
    const res = await request(t.app).post('/api/brands').set(bearer(key)).send({ name });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.brand.name).toBe(name);
    const make403 = await request(t.app).post('/api/api-keys').set(bearer(key)).send({ name: 'escalate', scope: 'write' });
    expect(make403.status).toBe(403);
    expect((await request(t.app).get('/api/users').set(bearer(key))).status).toBe(403);
  });

  it('a revoked key is a 401 from its next call on; an unknown or malformed one too', async () => {
    const created = await make('write');
    await request(t.app).get('/api/search').query({ q: 'coil' }).set(bearer(created.key)).expect(200);
    await admin.agent.delete(`/api/api-keys/${created.id}`).set('x-csrf-token', admin.token).expect(204);
    const revoked = await request(t.app).get('/api/search').query({ q: 'coil' }).set(bearer(created.key));
    expect(revoked.status).toBe(401);
    expect(revoked.body.error.code).toBe('unauthorized');
    expect(
      (
        await request(t.app)
          .get('/api/search')
          .set(bearer(`${created.key.slice(0, -2)}xx`))
      ).status,
    ).toBe(401);
    expect((await request(t.app).get('/api/search').set('Authorization', created.key)).status).toBe(401);
    const list = apiKeyListSchema.parse((await admin.agent.get('/api/api-keys').expect(200)).body);
    expect(list.apiKeys.find((k) => k.id === created.id)?.revokedAt).not.toBeNull();
  });

  it('a key call never falls back to the session: a bad key with a signed-in cookie is still a 401', async () => {
    const created = await make('read');
    await admin.agent.delete(`/api/api-keys/${created.id}`).set('x-csrf-token', admin.token).expect(204);
    // The admin's own cookie jar, plus a revoked key: judged by the key alone.
    const res = await admin.agent.get('/api/users').set(bearer(created.key));
    expect(res.status).toBe(401);
    // And a live read key with the admin's cookie does not gain the admin's rights.
    const live = await make('read');
    expect((await admin.agent.get('/api/users').set(bearer(live.key))).status).toBe(403);
  });

  it('every call is written to the audit log under the key’s name', async () => {
    const name = `Web shop ${randomUUID().slice(0, 6)}`;
    const created = await make('read', name);
    await request(t.app).get('/api/search').query({ q: 'QW-IC 3140' }).set(bearer(created.key)).expect(200);
    await request(t.app).post('/api/parts').set(bearer(created.key)).send({}).expect(403);
    expect(await auditedCalls(created.id, 2)).toEqual([
      { key: name, method: 'GET', path: '/api/search?q=QW-IC%203140', status: 200 },
      { key: name, method: 'POST', path: '/api/parts', status: 403 },
    ]);
    const list = apiKeyListSchema.parse((await admin.agent.get('/api/api-keys').expect(200)).body);
    expect(list.apiKeys.find((k) => k.id === created.id)?.lastUsedAt).not.toBeNull();
  });

  it('calls are limited per key, in PostgreSQL: 429 with Retry-After; another key is not affected', async () => {
    const strict = await createTestApp({ API_KEY_MAX_PER_MINUTE: '3' });
    try {
      const a = await make('read');
      const b = await make('read');
      for (let i = 0; i < 3; i++) await request(strict.app).get('/api/vehicles/years').set(bearer(a.key)).expect(200);
      const refused = await request(strict.app).get('/api/vehicles/years').set(bearer(a.key));
      expect(refused.status).toBe(429);
      expect(refused.body.error.code).toBe('rate_limited');
      const retryAfter = Number(refused.headers['retry-after']);
      expect(retryAfter).toBeGreaterThan(0);
      expect(retryAfter).toBeLessThanOrEqual(60);
      await request(strict.app).get('/api/vehicles/years').set(bearer(b.key)).expect(200);
      // The refused call is audited too.
      expect((await auditedCalls(a.id, 4)).map((c) => c.status)).toEqual([200, 200, 200, 429]);
      await auditedCalls(b.id, 1);
    } finally {
      await strict.close();
    }
  });
});
