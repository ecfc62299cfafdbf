import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_SETTINGS } from '../../../shared/schemas/settings';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { waitForMail } from '../../helpers/mail';
import { createTestApp, signIn, type Agent, type TestApp } from '../../helpers/test-app';
import { engineIdOf, partIdOf } from './helpers';

describe('fit reports and settings', () => {
  let t: TestApp;
  let inputs: { original: { partId: string }; substitute: { partId: string }; engine: { engineId: string } };
  let techA: { agent: Agent; token: string };
  let techB: { agent: Agent; token: string };
  let admin: { agent: Agent; token: string };

  beforeAll(async () => {
    t = await createTestApp();
    const ds = t.deps.dataSource;
    techA = await signIn(t.app, (await makeUser(ds, 'technician')).email, TEST_PASSWORD);
    techB = await signIn(t.app, (await makeUser(ds, 'technician')).email, TEST_PASSWORD);
    admin = await signIn(t.app, (await makeUser(ds, 'admin')).email, TEST_PASSWORD);
    inputs = {
      original: { partId: await partIdOf(ds, 'QW-IC 3101') },
      substitute: { partId: await partIdOf(ds, 'QW-IC 3104') },
      engine: { engineId: await engineIdOf(ds, 'VK16') },
    };
  });
  afterAll(() => t.close());

  it('saves a report with the server\u2019s own verdict, shares it read-only, and keeps it within the shop', async () => {
    // A client claiming "go" is ignored: the server recomputes from the inputs.
    const res = await techA.agent
      .post('/api/fit-reports')
      .set('x-csrf-token', techA.token)
      .send({ kind: 'coil', title: 'Customer coil', inputs, verdict: 'go' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const report = res.body.fitReport as { id: string; verdict: string; shareUrl: string; result: { checks: unknown[] } };
    expect(report.verdict).toBe('review');
    expect(report.result.checks).toHaveLength(9);
    const token = report.shareUrl.split('/').pop()!;
    expect(token.length).toBeGreaterThanOrEqual(32);

    const shared = await request(t.app).get(`/api/shared/fit-reports/${token}`).expect(200);
    expect(shared.body.fitReport.id).toBe(report.id);
    await request(t.app)
      .get(`/api/shared/fit-reports/${token.slice(0, -3)}xyz`)
      .expect(404);

    await techB.agent.get(`/api/fit-reports/${report.id}`).expect(404);
    expect(((await techB.agent.get('/api/fit-reports').expect(200)).body.fitReports as { id: string }[]).map((r) => r.id)).not.toContain(
      report.id,
    );
    expect(((await techA.agent.get('/api/fit-reports').expect(200)).body.fitReports as { id: string }[]).map((r) => r.id)).toContain(
      report.id,
    );
    await admin.agent.get(`/api/fit-reports/${report.id}`).expect(200);
  });

  it('e-mails a report through SMTP with its link', async () => {
    const res = await techA.agent.post('/api/fit-reports').set('x-csrf-token', techA.token).send({ kind: 'coil', inputs });
    const { id, shareUrl } = res.body.fitReport as { id: string; shareUrl: string };
    const to = `customer-${randomUUID().slice(0, 6)}@example.test`;
    await techA.agent.post(`/api/fit-reports/${id}/email`).set('x-csrf-token', techA.token).send({ to }).expect(202);
    const mail = await waitForMail(to);
    expect(mail.subject).toMatch(/Fit report/);
    expect(mail.text).toContain(shareUrl);
    expect(mail.text).toMatch(/tens of kilovolts/);
    await techB.agent.post(`/api/fit-reports/${id}/email`).set('x-csrf-token', techB.token).send({ to }).expect(404);
  });

  it('an admin\u2019s threshold change reaches the verdicts, and bad settings are refused by field', async () => {
    const compare = async () =>
      (await techA.agent.post('/api/compat/coil').set('x-csrf-token', techA.token).send(inputs).expect(200)).body as {
        checks: { id: string; verdict: string }[];
      };
    expect((await compare()).checks.find((c) => c.id === 'energy-cranking')?.verdict).toBe('review');
    const relaxed = { ...DEFAULT_SETTINGS, compat: { ...DEFAULT_SETTINGS.compat, energyGoRatio: 0.3, energyReviewRatio: 0.2 } };
    await admin.agent.put('/api/settings').set('x-csrf-token', admin.token).send({ settings: relaxed }).expect(200);
    try {
      expect((await compare()).checks.find((c) => c.id === 'energy-cranking')?.verdict).toBe('go');
    } finally {
      await admin.agent.put('/api/settings').set('x-csrf-token', admin.token).send({ settings: DEFAULT_SETTINGS }).expect(200);
    }
    const bad = await admin.agent
      .put('/api/settings')
      .set('x-csrf-token', admin.token)
      .send({ settings: { ...DEFAULT_SETTINGS, compat: { ...DEFAULT_SETTINGS.compat, energyReviewRatio: 0.95 } } });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.error.details)).toContain('energyReviewRatio');
    await techA.agent.get('/api/settings').expect(403);
  });
});
