import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_COOKIE } from '../../../server/middleware/csrf';
import { SESSION_COOKIE } from '../../../server/middleware/session';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, csrfAgent, signIn, type TestApp } from '../../helpers/test-app';

function cookieFrom(res: request.Response, name: string): string {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  const found = raw?.find((c) => c.startsWith(`${name}=`));
  if (!found) throw new Error(`no ${name} cookie set`);
  return found.split(';')[0]!;
}

describe('CSRF protection (double-submit token bound to the session)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('GET /api/auth/csrf returns a token and sets its cookie', async () => {
    const res = await request(t.app).get('/api/auth/csrf').expect(200);
    expect(typeof res.body.token).toBe('string');
    expect((res.headers['set-cookie'] as unknown as string[]).some((c) => c.startsWith('arcwise.csrf='))).toBe(true);
  });

  it('refuses a state change without the token, with a wrong token, and with a token but no cookie', async () => {
    const admin = await makeUser(t.deps.dataSource, 'admin');
    const { agent, token } = await signIn(t.app, admin.email, TEST_PASSWORD);
    const body = { email: 'csrf-victim@example.test', name: 'Victim', role: 'clerk' };
    const none = await agent.post('/api/users/invite').send(body);
    expect(none.status).toBe(403);
    expect(none.body.error.code).toBe('csrf_invalid');
    const wrong = await agent
      .post('/api/users/invite')
      .set('x-csrf-token', `${token.slice(0, -4)}abcd`)
      .send(body);
    expect(wrong.status).toBe(403);
    const noCookie = await request(t.app)
      .post('/api/auth/login')
      .set('x-csrf-token', token)
      .send({ email: admin.email, password: TEST_PASSWORD });
    expect(noCookie.status).toBe(403);
    const users = await agent.get('/api/users').expect(200);
    expect((users.body.users as { email: string }[]).some((u) => u.email === body.email)).toBe(false);
  });

  it('a token and its cookie taken from one session are refused in another session (403)', async () => {
    const admin = await makeUser(t.deps.dataSource, 'admin');
    const victim = await csrfAgent(t.app);
    const login = await victim.agent
      .post('/api/auth/login')
      .set('x-csrf-token', victim.token)
      .send({ email: admin.email, password: TEST_PASSWORD })
      .expect(200);
    const victimSession = cookieFrom(login, SESSION_COOKIE);
    const victimCsrf = await victim.agent.get('/api/auth/csrf').expect(200);
    // The attacker's own visit: a valid token with its cookie, for the attacker's session.
    const attackerCsrf = await request(t.app).get('/api/auth/csrf').expect(200);
    const send = (csrf: request.Response, email: string) =>
      request(t.app)
        .post('/api/users/invite')
        .set('Cookie', `${victimSession}; ${cookieFrom(csrf, CSRF_COOKIE)}`)
        .set('x-csrf-token', csrf.body.token as string)
        .send({ email, name: 'Invited', role: 'clerk' });
    // Planted into the victim's browser (cookie tossing), next to the victim's session cookie: refused.
    const tossed = await send(attackerCsrf, 'tossed-cookie@example.test');
    expect(tossed.status).toBe(403);
    expect(tossed.body.error.code).toBe('csrf_invalid');
    // The same request with the victim's own token and cookie passes (the control).
    expect((await send(victimCsrf, 'own-token@example.test')).status).toBe(201);
  });

  it('the token from before sign-in is refused after it, and a token fetched after sign-in or sign-out works', async () => {
    const admin = await makeUser(t.deps.dataSource, 'admin');
    const { agent, token: before } = await csrfAgent(t.app);
    await agent.post('/api/auth/login').set('x-csrf-token', before).send({ email: admin.email, password: TEST_PASSWORD }).expect(200);
    const stale = await agent.post('/api/auth/logout').set('x-csrf-token', before);
    expect(stale.status).toBe(403);
    expect(stale.body.error.code).toBe('csrf_invalid');
    const during = (await agent.get('/api/auth/csrf').expect(200)).body.token as string;
    expect(during).not.toBe(before);
    await agent.post('/api/auth/logout').set('x-csrf-token', during).expect(204);
    // Signed out, the session is gone: its token with it.
    const afterLogout = await agent
      .post('/api/auth/login')
      .set('x-csrf-token', during)
      .send({ email: admin.email, password: TEST_PASSWORD });
    expect(afterLogout.status).toBe(403);
    const after = (await agent.get('/api/auth/csrf').expect(200)).body.token as string;
    await agent.post('/api/auth/login').set('x-csrf-token', after).send({ email: admin.email, password: TEST_PASSWORD }).expect(200);
  });
});
