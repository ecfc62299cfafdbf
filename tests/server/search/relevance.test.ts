import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PartDetail } from '../../../shared/schemas/parts';
import type { SearchResponse } from '../../../shared/schemas/search';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { onlyJob, waitForJobState } from '../../helpers/jobs';
import { JUDGED_QUERIES, reciprocalRank } from '../../helpers/judged-queries';
import { createTestApp, signIn, type Agent, type TestApp } from '../../helpers/test-app';

/** The judged queries (tests/helpers/judged-queries.ts) against the demo catalog, as a clerk searches. */
describe('search relevance on the judged queries', () => {
  let t: TestApp;
  let clerk: Agent;
  const top = async (q: string, limit = 10): Promise<string[]> => {
    const res = await clerk.get('/api/search').query({ q, limit });
    expect(res.status, `${q}: ${JSON.stringify(res.body)}`).toBe(200);
    return (res.body as SearchResponse).hits.map((h) => h.partNumber);
  };

  beforeAll(async () => {
    t = await createTestApp();
    const u = await makeUser(t.deps.dataSource, 'clerk');
    clerk = (await signIn(t.app, u.email, TEST_PASSWORD)).agent;
  });
  afterAll(() => t.close());

  it('has at least 40 judged queries covering every kind of query', () => {
    expect(JUDGED_QUERIES.length).toBeGreaterThanOrEqual(40);
    const kinds = new Set(JUDGED_QUERIES.map((j) => j.kind));
    expect([...kinds].sort()).toEqual(['gtin', 'interchange', 'number', 'supersession', 'typo', 'vehicle', 'words']);
  });

  it('puts an expected part in the first three for every judged query', async () => {
    const misses: string[] = [];
    let sum = 0;
    for (const j of JUDGED_QUERIES) {
      const hits = await top(j.q);
      const rr = reciprocalRank(hits.slice(0, 3), j.expect);
      sum += reciprocalRank(hits, j.expect);
      if (rr === 0) misses.push(`"${j.q}" → [${hits.slice(0, 5).join(', ')}], expected one of [${j.expect.join(', ')}]`);
    }
    console.log(`judged queries: ${JUDGED_QUERIES.length}, mean reciprocal rank ${(sum / JUDGED_QUERIES.length).toFixed(3)}`);
    expect(misses).toEqual([]);
  });

  it('ranks a part of ours with a spec and stock above a stub row without them for the same words', async () => {
    const buyer = await makeUser(t.deps.dataSource, 'buyer');
    const { agent, token } = await signIn(t.app, buyer.email, TEST_PASSWORD);
    const tag = String(Math.floor(Math.random() * 1e5)).padStart(5, '0');
    // QW-IC 3101 has a spec and 14 on hand in the demo; the stub has the same words and neither.
    const words = 'Ignition coil, coil-on-plug, integrated igniter, 3-pin A';
    const stub = `QW-IC 9${tag}`;
    const created = await agent
      .post('/api/parts')
      .set('x-csrf-token', token)
      .send({ brand: 'Quaywell', partNumber: stub, kind: 'coil', description: words });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    // The index catches up after the commit: wait for the refresh job (a search for the number
    // would find the stub in PostgreSQL before the index has it).
    const job = await onlyJob(t.deps.dataSource, 'search.refresh', { partIds: [(created.body as PartDetail).part.id] });
    await waitForJobState(t.deps.dataSource, job.id, ['completed']);
    const hits = await top('coil-on-plug integrated igniter 3-pin A', 20);
    expect(hits).toContain(stub);
    expect(hits.indexOf('QW-IC 3101')).toBeGreaterThanOrEqual(0);
    expect(hits.indexOf('QW-IC 3101')).toBeLessThan(hits.indexOf(stub));
  });
});
