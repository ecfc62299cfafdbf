import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SESSION_COOKIE } from '../../../server/middleware/session';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, csrfAgent, type TestApp } from '../../helpers/test-app';

function sessionCookie(res: request.Response): string | undefined {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  return raw?.find((c) => c.startsWith(`${SESSION_COOKIE}=`))?.split(';')[0];
}

describe('sign-in', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('signs in with the right password and returns the user without secrets', async () => {
    const u = await makeUser(t.deps.dataSource, 'clerk');
    const { agent, token } = await csrfAgent(t.app);
    const res = await agent
      .post('/api/auth/login')
      .set('x-csrf-token', token)
      .send({ email: u.email.toUpperCase(), password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ user: { id: u.id, email: u.email, name: u.name, role: 'clerk', shopId: null, homeLocationId: null } });
    expect(JSON.stringify(res.body)).not.toContain('password');
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body.user.id).toBe(u.id);
  });

  it('refuses a wrong password, an unknown user and a disabled user with the same 401 message', async () => {
    const ok = await makeUser(t.deps.dataSource, 'buyer');
    const disabled = await makeUser(t.deps.dataSource, 'buyer', { disabled: true });
    const { agent, token } = await csrfAgent(t.app);
    const attempts = [
      { email: ok.email, password: 'not-the-password' },
      { email: 'nobody-here@example.test', password: TEST_PASSWORD },
      { email: disabled.email, password: TEST_PASSWORD },
    ];
    const messages = new Set<string>();
    for (const body of attempts) {
      const res = await agent.post('/api/auth/login').set('x-csrf-token', token).send(body);
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('unauthorized');
      messages.add(res.body.error.message as string);
    }
    expect(messages.size).toBe(1);
    await agent.get('/api/auth/me').expect(401);
  });

  it('regenerates the session id at sign-in', async () => {
    const u = await makeUser(t.deps.dataSource, 'clerk');
    // Session fixation: the visitor session an attacker would plant is a real one, with its token.
    const agent = request.agent(t.app);
    const visit = await agent.get('/api/auth/csrf').expect(200);
    const planted = sessionCookie(visit);
    expect(planted).toBeDefined();
    const res = await agent
      .post('/api/auth/login')
      .set('x-csrf-token', visit.body.token as string)
      .send({ email: u.email, password: TEST_PASSWORD })
      .expect(200);
    const issued = sessionCookie(res);
    expect(issued).toBeDefined();
    expect(issued).not.toBe(planted);
    // A second sign-in on the same agent, with the token of the new session, gets a new id again.
    const token = (await agent.get('/api/auth/csrf').expect(200)).body.token as string;
    const again = await agent
      .post('/api/auth/login')
      .set('x-csrf-token', token)
      .send({ email: u.email, password: TEST_PASSWORD })
      .expect(200);
    const second = sessionCookie(again);
    expect(second).toBeDefined();
    expect(second).not.toBe(issued);
    const rows: { n: number }[] = await t.deps.dataSource.query(
      `SELECT count(*)::int AS n FROM session WHERE sess->'passport'->>'user' = $1`,
      [u.id],
    );
    expect(rows[0]?.n).toBe(1);
  });

  it('logout ends the session on the server, not just in the browser', async () => {
    const u = await makeUser(t.deps.dataSource, 'clerk');
    const { agent, token } = await csrfAgent(t.app);
    const res = await agent
      .post('/api/auth/login')
      .set('x-csrf-token', token)
      .send({ email: u.email, password: TEST_PASSWORD })
      .expect(200);
    const cookie = sessionCookie(res)!;
    const sessionToken = (await agent.get('/api/auth/csrf').expect(200)).body.token as string;
    await agent.post('/api/auth/logout').set('x-csrf-token', sessionToken).expect(204);
    // Replaying the old cookie must not work.
    await request(t.app).get('/api/auth/me').set('Cookie', cookie).expect(401);
    const rows: { n: number }[] = await t.deps.dataSource.query(
      `SELECT count(*)::int AS n FROM session WHERE sess->'passport'->>'user' = $1`,
      [u.id],
    );
    expect(rows[0]?.n).toBe(0);
  });

  it('sets httpOnly, sameSite=lax session cookies', async () => {
    const u = await makeUser(t.deps.dataSource, 'clerk');
    const { agent, token } = await csrfAgent(t.app);
    const res = await agent
      .post('/api/auth/login')
      .set('x-csrf-token', token)
      .send({ email: u.email, password: TEST_PASSWORD })
      .expect(200);
    const raw = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith(SESSION_COOKIE))!;
    expect(raw).toMatch(/HttpOnly/i);
    expect(raw).toMatch(/SameSite=Lax/i);
  });

  it('sends helmet security headers', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
  });
});
