import { randomInt } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../../seed/users';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, type TestApp } from '../../helpers/test-app';

const ADMIN = 'admin@harborlane.test';

/** A documentation address (RFC 5737 TEST-NET-3) not used by any other test of this run. */
const used = new Set<string>();
function freshAddress(): string {
  for (;;) {
    const ip = `203.0.113.${randomInt(1, 255)}`;
    if (!used.has(ip)) {
      used.add(ip);
      return ip;
    }
  }
}

/** One sign-in attempt from the given client address, as a proxy in front of Arcwise would report it. */
async function attempt(t: TestApp, from: string, email: string, password: string): Promise<request.Response> {
  const agent = request.agent(t.app);
  const { token } = (await agent.get('/api/auth/csrf').set('X-Forwarded-For', from).expect(200)).body as { token: string };
  return agent.post('/api/auth/login').set('X-Forwarded-For', from).set('x-csrf-token', token).send({ email, password });
}

describe('sign-in limits, counted in PostgreSQL per (e-mail, client address) and per client address', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ TRUST_PROXY: 'true' });
  });
  afterAll(() => t.close());

  it('five wrong passwords for admin from one address, then the right password from another address: signed in', async () => {
    const attacker = freshAddress();
    const owner = freshAddress();
    for (let i = 0; i < 5; i++) expect((await attempt(t, attacker, ADMIN, `wrong-guess-${i}`)).status).toBe(401);
    const ok = await attempt(t, owner, ADMIN, DEMO_PASSWORD);
    expect(ok.status).toBe(200);
    expect(ok.body.user.email).toBe(ADMIN);
  });

  it('the per-(e-mail, address) limit holds: the sixth attempt from that address is refused, right password included', async () => {
    const u = await makeUser(t.deps.dataSource, 'clerk');
    const from = freshAddress();
    const limit = t.deps.env.LOGIN_MAX_PER_ACCOUNT_AND_CLIENT;
    for (let i = 0; i < limit; i++) expect((await attempt(t, from, u.email, 'wrong-password')).status).toBe(401);
    const blocked = await attempt(t, from, u.email, TEST_PASSWORD);
    expect(blocked.status).toBe(429);
    expect(blocked.body).toEqual({ error: { code: 'rate_limited', message: expect.any(String) } });
    // RFC 9110 §10.2.3: Retry-After in seconds; the window is 15 minutes.
    const retryAfter = Number(blocked.headers['retry-after']);
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(t.deps.env.LOGIN_WINDOW_MINUTES * 60);
    // Another account from the same address is not blocked by it.
    const other = await makeUser(t.deps.dataSource, 'clerk');
    expect((await attempt(t, from, other.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('a right password clears that account’s failures from that address', async () => {
    const u = await makeUser(t.deps.dataSource, 'buyer');
    const from = freshAddress();
    const limit = t.deps.env.LOGIN_MAX_PER_ACCOUNT_AND_CLIENT;
    for (let i = 0; i < limit - 1; i++) expect((await attempt(t, from, u.email, 'wrong-password')).status).toBe(401);
    expect((await attempt(t, from, u.email, TEST_PASSWORD)).status).toBe(200);
    for (let i = 0; i < limit - 1; i++) expect((await attempt(t, from, u.email, 'wrong-password')).status).toBe(401);
    expect((await attempt(t, from, u.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('the per-address limit holds across accounts, and another address is not affected', async () => {
    const strict = await createTestApp({ TRUST_PROXY: 'true', LOGIN_MAX_PER_CLIENT: '3', LOGIN_MAX_PER_ACCOUNT_AND_CLIENT: '100' });
    try {
      const from = freshAddress();
      for (let i = 0; i < 3; i++) expect((await attempt(strict, from, `nobody-${i}@example.test`, 'nope-nope')).status).toBe(401);
      const u = await makeUser(strict.deps.dataSource, 'clerk');
      const refused = await attempt(strict, from, u.email, TEST_PASSWORD);
      expect(refused.status).toBe(429);
      expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
      expect((await attempt(strict, freshAddress(), u.email, TEST_PASSWORD)).status).toBe(200);
    } finally {
      await strict.close();
    }
  });

  it('the counters live in PostgreSQL: a second app server on the same database sees the same failures', async () => {
    const second = await createTestApp({ TRUST_PROXY: 'true' });
    try {
      const u = await makeUser(t.deps.dataSource, 'clerk');
      const from = freshAddress();
      const limit = t.deps.env.LOGIN_MAX_PER_ACCOUNT_AND_CLIENT;
      for (let i = 0; i < limit; i++) {
        const server = i % 2 === 0 ? t : second;
        expect((await attempt(server, from, u.email, 'wrong-password')).status).toBe(401);
      }
      expect((await attempt(second, from, u.email, TEST_PASSWORD)).status).toBe(429);
      expect((await attempt(t, from, u.email, TEST_PASSWORD)).status).toBe(429);
    } finally {
      await second.close();
    }
  });
});

describe('with TRUST_PROXY off, X-Forwarded-For is not believed', () => {
  let t: TestApp;
  beforeAll(async () => {
    // Only this app counts against these limits; the address is the socket's, the same for every attempt.
    t = await createTestApp({ TRUST_PROXY: 'false', LOGIN_MAX_PER_ACCOUNT_AND_CLIENT: '3' });
  });
  afterAll(() => t.close());

  it('a forged header on every attempt does not reset the per-(e-mail, address) count', async () => {
    const u = await makeUser(t.deps.dataSource, 'clerk');
    for (let i = 0; i < 3; i++) expect((await attempt(t, freshAddress(), u.email, 'wrong-password')).status).toBe(401);
    expect((await attempt(t, freshAddress(), u.email, TEST_PASSWORD)).status).toBe(429);
  });
});
