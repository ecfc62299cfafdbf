import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { waitForMail } from '../../helpers/mail';
import { createTestApp, csrfAgent, signIn, type TestApp } from '../../helpers/test-app';

const tokenFrom = (text: string): string => {
  const m = /accept-invite\?token=([A-Za-z0-9_%-]+)/.exec(text);
  if (!m?.[1]) throw new Error(`no invitation link in: ${text}`);
  return decodeURIComponent(m[1]);
};

describe('invitation, end to end through real SMTP', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('invite → the message reaches the SMTP catcher → accept → sign in', async () => {
    const admin = await makeUser(t.deps.dataSource, 'admin');
    const { agent, token } = await signIn(t.app, admin.email, TEST_PASSWORD);
    const email = `new-clerk-${randomUUID().slice(0, 6)}@example.test`;
    const invited = await agent.post('/api/users/invite').set('x-csrf-token', token).send({ email, name: 'New Clerk', role: 'clerk' });
    expect(invited.status).toBe(201);
    expect(invited.body.user).toMatchObject({ email, role: 'clerk', invitePending: true });
    const hours = (Date.parse(invited.body.expiresAt as string) - Date.now()) / 3.6e6;
    expect(hours).toBeGreaterThan(71.9);
    expect(hours).toBeLessThanOrEqual(72);

    const mail = await waitForMail(email);
    expect(mail.subject).toMatch(/invited/i);
    expect(mail.html).toContain('accept-invite?token=');
    const inviteToken = tokenFrom(mail.text);

    // Before accepting, the account cannot sign in.
    const pre = await csrfAgent(t.app);
    await pre.agent.post('/api/auth/login').set('x-csrf-token', pre.token).send({ email, password: 'a-new-password-1' }).expect(401);

    const fresh = await csrfAgent(t.app);
    const info = await fresh.agent.get(`/api/auth/invite/${encodeURIComponent(inviteToken)}`).expect(200);
    expect(info.body.invitation.email).toBe(email);
    await fresh.agent
      .post('/api/auth/accept-invite')
      .set('x-csrf-token', fresh.token)
      .send({ token: inviteToken, password: 'short' })
      .expect(400);
    await fresh.agent
      .post('/api/auth/accept-invite')
      .set('x-csrf-token', fresh.token)
      .send({ token: inviteToken, password: 'a-new-password-1' })
      .expect(200);
    // The link works once.
    await fresh.agent
      .post('/api/auth/accept-invite')
      .set('x-csrf-token', fresh.token)
      .send({ token: inviteToken, password: 'another-password-2' })
      .expect(400);

    const login = await fresh.agent.post('/api/auth/login').set('x-csrf-token', fresh.token).send({ email, password: 'a-new-password-1' });
    expect(login.status).toBe(200);
    expect(login.body.user.role).toBe('clerk');
  });

  it('the password rule at invitation: blank, common or the e-mail is a 400 naming the field; a good one is a 200', async () => {
    const admin = await makeUser(t.deps.dataSource, 'admin');
    const { agent, token } = await signIn(t.app, admin.email, TEST_PASSWORD);
    const email = `rule-${randomUUID().slice(0, 6)}@example.test`;
    await agent.post('/api/users/invite').set('x-csrf-token', token).send({ email, name: 'Rule Tester', role: 'clerk' }).expect(201);
    const inviteToken = tokenFrom((await waitForMail(email)).text);
    const fresh = await csrfAgent(t.app);
    const accept = (password: string) =>
      fresh.agent.post('/api/auth/accept-invite').set('x-csrf-token', fresh.token).send({ token: inviteToken, password });

    const blank = await accept(' '.repeat(12));
    expect(blank.status).toBe(400);
    expect(blank.body.error).toMatchObject({ code: 'validation_failed', message: 'password: must not be blank or only spaces' });
    expect(blank.body.error.details).toEqual([{ field: 'password', message: 'must not be blank or only spaces' }]);
    // In the common-password list zxcvbn-ts ships (@zxcvbn-ts/language-common, passwords-common).
    const common = await accept('password123');
    expect(common.status).toBe(400);
    expect(common.body.error.details[0].field).toBe('password');
    expect(common.body.error.message).toMatch(/^password: is a common password/);
    const own = await accept(email.toUpperCase());
    expect(own.status).toBe(400);
    expect(own.body.error.message).toBe('password: must not be your e-mail address or its name part');
    // None of the refusals used the invitation up.
    await accept('feeler-gauge-at-0.8mm').expect(200);
  });

  it('an expired invitation is refused', async () => {
    const admin = await makeUser(t.deps.dataSource, 'admin');
    const { agent, token } = await signIn(t.app, admin.email, TEST_PASSWORD);
    const email = `late-${randomUUID().slice(0, 6)}@example.test`;
    await agent.post('/api/users/invite').set('x-csrf-token', token).send({ email, name: 'Late', role: 'buyer' }).expect(201);
    const inviteToken = tokenFrom((await waitForMail(email)).text);
    await t.deps.dataSource.query(
      `UPDATE invitation SET expires_at = now() - interval '1 minute' WHERE user_id = (SELECT id FROM "user" WHERE email = $1)`,
      [email],
    );
    const fresh = await csrfAgent(t.app);
    const res = await fresh.agent
      .post('/api/auth/accept-invite')
      .set('x-csrf-token', fresh.token)
      .send({ token: inviteToken, password: 'a-new-password-1' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/expired/);
  });

  it('a technician must be invited into a shop; a duplicate e-mail is a 409', async () => {
    const admin = await makeUser(t.deps.dataSource, 'admin');
    const { agent, token } = await signIn(t.app, admin.email, TEST_PASSWORD);
    const noShop = await agent
      .post('/api/users/invite')
      .set('x-csrf-token', token)
      .send({ email: 'tech-x@example.test', name: 'T', role: 'technician' });
    expect(noShop.status).toBe(400);
    expect(JSON.stringify(noShop.body.error.details)).toContain('shopId');
    const dup = await agent.post('/api/users/invite').set('x-csrf-token', token).send({ email: admin.email, name: 'Again', role: 'clerk' });
    expect(dup.status).toBe(409);
  });
});

describe('team administration', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('disabling a user ends their sessions at once', async () => {
    const admin = await makeUser(t.deps.dataSource, 'admin');
    const clerk = await makeUser(t.deps.dataSource, 'clerk');
    const adminAgent = await signIn(t.app, admin.email, TEST_PASSWORD);
    const clerkAgent = await signIn(t.app, clerk.email, TEST_PASSWORD);
    await clerkAgent.agent.get('/api/auth/me').expect(200);
    const res = await adminAgent.agent.patch(`/api/users/${clerk.id}`).set('x-csrf-token', adminAgent.token).send({ disabled: true });
    expect(res.status).toBe(200);
    expect(res.body.user.disabled).toBe(true);
    await clerkAgent.agent.get('/api/auth/me').expect(401);
    const again = await csrfAgent(t.app);
    await again.agent
      .post('/api/auth/login')
      .set('x-csrf-token', again.token)
      .send({ email: clerk.email, password: TEST_PASSWORD })
      .expect(401);
  });

  it('changes a role, which takes effect on the next sign-in, and lists the team without secrets', async () => {
    const admin = await makeUser(t.deps.dataSource, 'admin');
    const clerk = await makeUser(t.deps.dataSource, 'clerk');
    const a = await signIn(t.app, admin.email, TEST_PASSWORD);
    await a.agent.patch(`/api/users/${clerk.id}`).set('x-csrf-token', a.token).send({ role: 'buyer' }).expect(200);
    const list = await a.agent.get('/api/users').expect(200);
    const row = (list.body.users as { id: string; role: string }[]).find((u) => u.id === clerk.id);
    expect(row?.role).toBe('buyer');
    expect(JSON.stringify(list.body)).not.toMatch(/password|hash/i);
    const c = await signIn(t.app, clerk.email, TEST_PASSWORD);
    await c.agent.get('/api/users').expect(403);
    expect((await c.agent.get('/api/auth/me')).body.user.role).toBe('buyer');
    await request(t.app).patch(`/api/users/${clerk.id}`).send({ role: 'admin' }).expect(403);
  });

  it('the outbox lists caught messages for an admin', async () => {
    const admin = await makeUser(t.deps.dataSource, 'admin');
    const a = await signIn(t.app, admin.email, TEST_PASSWORD);
    const email = `outbox-${randomUUID().slice(0, 6)}@example.test`;
    await a.agent.post('/api/users/invite').set('x-csrf-token', a.token).send({ email, name: 'Out Box', role: 'clerk' }).expect(201);
    await waitForMail(email);
    const res = await a.agent.get('/api/outbox').expect(200);
    expect((res.body.messages as { to: string }[]).some((m) => m.to.includes(email))).toBe(true);
  });
});
