import { createHash, randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { JobsResponse } from '../../../shared/schemas/jobs';
import { startMailCatcher, type MailCatcher } from '../../../server/mail/catcher';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { onlyJob, waitForJobState } from '../../helpers/jobs';
import { createTestApp, csrfAgent, signIn, type Agent, type TestApp } from '../../helpers/test-app';

describe('an invitation while the mail server is down', () => {
  let catcher: MailCatcher;
  let smtpPort: number;
  let t: TestApp;
  let admin: { agent: Agent; token: string };

  beforeAll(async () => {
    // This test's own SMTP catcher, stopped before the invitation and started again on the same port.
    catcher = await startMailCatcher();
    smtpPort = Number(new URL(catcher.smtpUrl).port);
    t = await createTestApp({ SMTP_URL: catcher.smtpUrl, MAIL_CATCHER_URL: catcher.httpUrl });
    admin = await signIn(t.app, (await makeUser(t.deps.dataSource, 'admin')).email, TEST_PASSWORD);
    await catcher.close();
  });
  afterAll(async () => {
    await t.close();
    await catcher.close().catch(() => undefined);
  });

  it('answers 201, retries the mail, and the link that finally arrives works; the token is never in the queue', async () => {
    const email = `queued-invitee-${randomUUID().slice(0, 6)}@example.test`;
    const invited = await admin.agent
      .post('/api/users/invite')
      .set('x-csrf-token', admin.token)
      .send({ email, name: 'Queued Invitee', role: 'clerk' });
    expect(invited.status, JSON.stringify(invited.body)).toBe(201);
    expect(invited.body.user).toMatchObject({ email, invitePending: true });

    const [invitation] = (await t.deps.dataSource.query(
      `SELECT i.id FROM invitation i JOIN "user" u ON u.id = i.user_id WHERE u.email = $1`,
      [email],
    )) as { id: string }[];
    const job = await onlyJob(t.deps.dataSource, 'mail.send', { kind: 'invitation', invitationId: invitation!.id });
    await waitForJobState(t.deps.dataSource, job.id, ['retry']);
    const listed = ((await admin.agent.get('/api/jobs').expect(200)).body as JobsResponse).jobs.find((j) => j.id === job.id);
    expect(listed).toMatchObject({ name: 'mail.send', state: 'retry', summary: 'Invitation e-mail', attempts: 1 });
    expect(listed?.lastError).toMatch(/ECONNREFUSED|connect/i);

    catcher = await startMailCatcher({ smtpPort });
    const mail = await vi.waitFor(
      () => {
        const found = catcher.messages.find((m) => m.to.includes(email));
        if (!found) throw new Error(`no mail to ${email} yet`);
        return found;
      },
      { timeout: 20_000, interval: 100 },
    );
    expect(mail.subject).toMatch(/invited/i);
    const token = decodeURIComponent(/accept-invite\?token=([A-Za-z0-9_%-]+)/.exec(mail.text)?.[1] ?? '');
    expect(token.length).toBeGreaterThanOrEqual(40);
    const done = await waitForJobState(t.deps.dataSource, job.id, ['completed']);
    expect(done.retry_count).toBeGreaterThanOrEqual(1);

    // Only the token's SHA-256 (FIPS 180-4, through node:crypto) is stored, and the queue holds ids, not the token.
    const [stored] = (await t.deps.dataSource.query(`SELECT token_hash FROM invitation WHERE id = $1`, [invitation!.id])) as {
      token_hash: string;
    }[];
    expect(stored?.token_hash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(JSON.stringify(done.data)).not.toContain(token);
    expect(done.data).toEqual({ kind: 'invitation', invitationId: invitation!.id });

    const fresh = await csrfAgent(t.app);
    const info = await fresh.agent.get(`/api/auth/invite/${encodeURIComponent(token)}`).expect(200);
    expect(info.body.invitation).toMatchObject({ email, name: 'Queued Invitee' });
  });
});
