import { randomBytes, randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { JobsResponse, JobSummary, RetryJobResponse } from '../../../shared/schemas/jobs';
import { onlyJob, waitForJobState } from '../../helpers/jobs';
import { OwnSearchApp } from '../../helpers/own-search';
import type { Agent, TestApp } from '../../helpers/test-app';

describe('a job that keeps failing', () => {
  let own: OwnSearchApp;
  let t: TestApp;
  let buyer: { agent: Agent; token: string };
  let admin: { agent: Agent; token: string };

  beforeAll(async () => {
    // The search service is down: every attempt of a refresh fails. Two attempts (one retry)
    // keep the test short; the backoff is the policy's.
    own = await OwnSearchApp.start({ down: true, env: { JOB_RETRY_LIMIT: '1' } });
    t = own.t;
    buyer = await own.signInAs('buyer');
    admin = await own.signInAs('admin');
  });
  afterAll(() => own.close());

  const listed = async (id: string): Promise<JobSummary | undefined> =>
    ((await admin.agent.get('/api/jobs').expect(200)).body as JobsResponse).jobs.find((j) => j.id === id);

  it('ends failed, shows on the Jobs page with its error, and a retry by hand runs it', async () => {
    const tag = randomBytes(3).toString('hex').toUpperCase();
    const created = await buyer.agent
      .post('/api/parts')
      .set('x-csrf-token', buyer.token)
      .send({ brand: 'Quaywell', partNumber: `QW-IC F${tag}`, kind: 'coil', description: 'Coil-on-plug coil, failed-job test' });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const partId = created.body.part.id as string;
    const job = await onlyJob(t.deps.dataSource, 'search.refresh', { partIds: [partId] });

    const failed = await vi.waitFor(
      async () => {
        const j = await listed(job.id);
        if (j?.state !== 'failed') throw new Error(`job is ${j?.state ?? 'not listed'}`);
        return j;
      },
      { timeout: 20_000, interval: 200 },
    );
    expect(failed).toMatchObject({ name: 'search.refresh', summary: '1 part', attempts: 2, maxAttempts: 2, nextAttemptAt: null });
    expect(failed.lastError).toMatch(/has failed|ECONNREFUSED|fetch failed/);
    expect(Date.parse(failed.failedAt!)).toBeGreaterThanOrEqual(Date.parse(failed.lastAttemptAt!));

    // Only an admin sees or retries jobs; an unknown job is a 404.
    await buyer.agent.get('/api/jobs').expect(403);
    await buyer.agent.post(`/api/jobs/${job.id}/retry`).set('x-csrf-token', buyer.token).expect(403);
    await admin.agent.post(`/api/jobs/${randomUUID()}/retry`).set('x-csrf-token', admin.token).expect(404);

    // The service is back (empty, set up again); the admin retries and the part reaches the index.
    await own.restartSearch();
    const retried = await admin.agent.post(`/api/jobs/${job.id}/retry`).set('x-csrf-token', admin.token).expect(200);
    expect((retried.body as RetryJobResponse).job).toMatchObject({ id: job.id, state: 'retry', maxAttempts: 3 });
    const done = await waitForJobState(t.deps.dataSource, job.id, ['completed']);
    expect(done.retry_count).toBe(2);
    const doc = await t.deps.search.index.getDocument(partId);
    expect(doc.description).toBe('Coil-on-plug coil, failed-job test');
    expect(await listed(job.id)).toBeUndefined();

    // A job no longer failed cannot be retried by hand.
    await admin.agent.post(`/api/jobs/${job.id}/retry`).set('x-csrf-token', admin.token).expect(404);
  });
});
