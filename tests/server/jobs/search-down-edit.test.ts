import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { JobsResponse } from '../../../shared/schemas/jobs';
import type { SearchResponse } from '../../../shared/schemas/search';
import { onlyJob, queuedJobs, waitForJobState } from '../../helpers/jobs';
import { OwnSearchApp } from '../../helpers/own-search';
import type { Agent, TestApp } from '../../helpers/test-app';
import { inventedWord } from '../../helpers/words';

describe('a catalog edit while the search service is down', () => {
  let own: OwnSearchApp;
  let t: TestApp;
  let buyer: { agent: Agent; token: string };
  let admin: { agent: Agent; token: string };

  beforeAll(async () => {
    own = await OwnSearchApp.start();
    t = own.t;
    await t.deps.search.rebuild(t.deps.dataSource);
    buyer = await own.signInAs('buyer');
    admin = await own.signInAs('admin');
  });
  afterAll(() => own.close());

  const search = async (q: string) => ((await buyer.agent.get('/api/search').query({ q }).expect(200)).body as SearchResponse).hits;

  it('answers 200, and the edit reaches the index once the service is back (the job retried)', async () => {
    const tag = randomBytes(3).toString('hex').toUpperCase();
    const created = await buyer.agent
      .post('/api/parts')
      .set('x-csrf-token', buyer.token)
      .send({ brand: 'Quaywell', partNumber: `QW-IC Q${tag}`, kind: 'coil', description: 'Coil-on-plug coil, queue test' })
      .expect(201);
    const partId = created.body.part.id as string;
    const indexed = await onlyJob(t.deps.dataSource, 'search.refresh', { partIds: [partId] });
    await waitForJobState(t.deps.dataSource, indexed.id, ['completed']);

    await own.stopSearch();
    const word = inventedWord();
    const edited = await buyer.agent
      .patch(`/api/parts/${partId}`)
      .set('x-csrf-token', buyer.token)
      .send({ description: `Coil-on-plug coil, ${word} series` });
    expect(edited.status, JSON.stringify(edited.body)).toBe(200);
    expect(edited.body.part.description).toBe(`Coil-on-plug coil, ${word} series`);

    // The first attempt failed against the stopped service; the admin sees the job waiting to retry.
    // The edit queued its own refresh, beside the create's (done).
    const jobs = await queuedJobs(t.deps.dataSource, 'search.refresh', { partIds: [partId] });
    expect(jobs.map((j) => j.id)[0]).toBe(indexed.id);
    expect(jobs).toHaveLength(2);
    const refresh = jobs[1]!;
    const listed = await vi.waitFor(
      async () => {
        const body = (await admin.agent.get('/api/jobs').expect(200)).body as JobsResponse;
        const job = body.jobs.find((j) => j.id === refresh.id);
        if (!job) throw new Error('the refresh job is not listed yet');
        return job;
      },
      { timeout: 15_000, interval: 100 },
    );
    expect(listed).toMatchObject({ name: 'search.refresh', state: 'retry', summary: '1 part', attempts: 1, maxAttempts: 7 });
    expect(listed.lastError).toEqual(expect.any(String));
    expect(listed.nextAttemptAt).toEqual(expect.any(String));
    // A job still retrying on its own is not retried by hand.
    await admin.agent.post(`/api/jobs/${refresh.id}/retry`).set('x-csrf-token', admin.token).expect(409);

    // The service comes back on the same address, its index set up again but without this edit.
    await own.restartSearch();
    const hits = await vi.waitFor(
      async () => {
        const found = await search(word);
        if (!found.some((h) => h.partId === partId)) throw new Error(`"${word}" finds nothing yet`);
        return found;
      },
      { timeout: 20_000, interval: 200 },
    );
    expect(hits[0]).toMatchObject({ partId, description: `Coil-on-plug coil, ${word} series` });
    const after = await waitForJobState(t.deps.dataSource, refresh.id, ['completed']);
    expect(after.retry_count).toBeGreaterThanOrEqual(1);
  });
});
