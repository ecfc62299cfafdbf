import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

describe('CSRF protection (double-submit token)', () => {
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
});
