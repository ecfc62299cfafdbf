import request from 'supertest';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it, vi } from 'vitest';
import type { SearchResponse } from '../../../shared/schemas/search';
import { createDataSource } from '../../../server/db/data-source';
import { waitForBackendsGone } from '../../helpers/backends';
import { startChildServer, type ChildServer } from '../../helpers/child-server';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { signInAt, type SignedInAt } from '../../helpers/http-agent';
import { newSupplier, post, stage } from '../../helpers/price-list-api';
import { isFullyCommitted, isUntouched, listState } from '../../helpers/price-list-checks';
import { bulkCsv, bulkRows, runTag, seededRandom } from '../../helpers/price-list-files';
import { inventedWord } from '../../helpers/words';

/** Below the 5,000 parts above which a commit queues a whole rebuild instead of a refresh. */
const ROWS = 4_000;
const KILLS = 3;
/** A seeded coil's number: a search for it is answered whatever the index is doing. */
const SEEDED_NUMBER = 'QW-IC 3140';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * The chain's layout on one machine: two app servers that only queue follow-up jobs (JOB_WORKERS=0),
 * one worker process, one database, one search service and one mail catcher (the test run's),
 * each server its own node process on loopback, as `npm start` and `npm run worker` run them.
 */
describe('two app servers on one database and one search service', () => {
  let ds: DataSource;
  let a: ChildServer;
  let b: ChildServer;
  let worker: ChildServer;
  const tag = runTag();
  // node-postgres names A's connections after PGAPPNAME, so the test can watch its transactions.
  const appNameOfA = (round: number) => `arcwise-two-a-${tag}-${round}`;

  beforeAll(async () => {
    ds = await createDataSource(inject('databaseUrl')).initialize();
    [a, b, worker] = await Promise.all([
      startChildServer('index', { JOB_WORKERS: '0', PGAPPNAME: appNameOfA(0) }),
      startChildServer('index', { JOB_WORKERS: '0' }),
      startChildServer('worker'),
    ]);
  }, 120_000);
  afterAll(async () => {
    await Promise.all([a, b, worker].map((s) => s?.ensureGone()));
    await ds.destroy();
  });

  it('a session made on A is valid on B', async () => {
    const clerk = await makeUser(ds, 'clerk');
    const atA = await signInAt(a.url, clerk.email, TEST_PASSWORD);
    const me = await request(b.url).get('/api/auth/me').set('Cookie', atA.sessionCookie).expect(200);
    expect(me.body.user).toMatchObject({ id: clerk.id, role: 'clerk' });
    await request(b.url).get('/api/auth/me').expect(401);
  });

  it('a part created through A is found by a search through B, once the worker has run its job', async () => {
    const buyer = await makeUser(ds, 'buyer');
    const atA = await signInAt(a.url, buyer.email, TEST_PASSWORD);
    const word = inventedWord();
    const created = await atA.agent
      .post('/api/parts')
      .set('x-csrf-token', atA.token)
      .send({ brand: 'Quaywell', partNumber: `QW-IC T${tag}`, kind: 'coil', description: `Coil-on-plug coil, ${word} series` });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const partId = (created.body as { part: { id: string } }).part.id;
    // Neither app server runs jobs: only the worker process can put the part in the index.
    const hits = await vi.waitFor(
      async () => {
        const res = await request(b.url).get('/api/search').query({ q: word }).set('Cookie', atA.sessionCookie).expect(200);
        const found = (res.body as SearchResponse).hits;
        if (!found.some((h) => h.partId === partId)) throw new Error(`"${word}" finds nothing through B yet`);
        return found;
      },
      { timeout: 30_000, interval: 200 },
    );
    expect(hits[0]).toMatchObject({ partId, description: `Coil-on-plug coil, ${word} series` });
  });

  // Needs the sign-in limits counted in PostgreSQL (rate-limiter-flexible): with counters in each
  // process's memory, A counts three failures and B two, and the sixth attempt is a 401.
  it('the sign-in failure limit counts across both: five failures spread over A and B, the sixth is 429 on either', async () => {
    const clerk = await makeUser(ds, 'clerk');
    const attempt = async (url: string) => {
      const agent = request.agent(url);
      const token = ((await agent.get('/api/auth/csrf').expect(200)).body as { token: string }).token;
      return agent.post('/api/auth/login').set('x-csrf-token', token).send({ email: clerk.email, password: 'not-the-password' });
    };
    for (const url of [a.url, b.url, a.url, b.url, a.url]) expect((await attempt(url)).status, url).toBe(401);
    const sixthOnB = await attempt(b.url);
    expect(sixthOnB.status).toBe(429);
    expect(sixthOnB.body.error.code).toBe('rate_limited');
    expect((await attempt(a.url)).status).toBe(429);
  });

  it(`kill -9 of A during price-list commits (${KILLS} times): each list whole or untouched, and B answers throughout`, async () => {
    const buyer = await makeUser(ds, 'buyer');
    const clerk = await makeUser(ds, 'clerk');
    const buyerAtB = await signInAt(b.url, buyer.email, TEST_PASSWORD);
    const clerkAtB = await signInAt(b.url, clerk.email, TEST_PASSWORD);
    const supplier = await newSupplier(buyerAtB, 'Two servers');
    let version = 0;
    const stageVersion = () => stage(buyerAtB, { supplierId: supplier.id, file: bulkCsv(bulkRows(tag, ROWS, version++)) });

    // The first list, committed through B, makes the parts and tells how long a commit takes.
    let lastCommitted = await stageVersion();
    const started = performance.now();
    expect((await post(buyerAtB, `/api/price-lists/${lastCommitted.id}/commit`)).status).toBe(200);
    const commitMs = performance.now() - started;

    // B is asked for readiness and a search every 50 ms while A is killed and started again.
    const watch = { stop: false, probes: 0, failures: [] as string[] };
    const watching = (async () => {
      while (!watch.stop) {
        const [ready, search] = await Promise.all([
          request(b.url).get('/readyz'),
          request(b.url).get('/api/search').query({ q: SEEDED_NUMBER }).set('Cookie', clerkAtB.sessionCookie),
        ]);
        watch.probes++;
        if (ready.status !== 200) watch.failures.push(`readyz ${ready.status} ${JSON.stringify(ready.body)}`);
        if (search.status !== 200 || (search.body as SearchResponse).hits.length === 0)
          watch.failures.push(`search ${search.status} ${JSON.stringify(search.body).slice(0, 200)}`);
        await sleep(50);
      }
    })();

    const random = seededRandom(11);
    const outcomes = { committed: 0, untouched: 0 };
    for (let round = 0; round < KILLS; round++) {
      const current = await stageVersion();
      if (round > 0) a = await startChildServer('index', { JOB_WORKERS: '0', PGAPPNAME: appNameOfA(round) });
      const buyerAtA: SignedInAt = await signInAt(a.url, buyer.email, TEST_PASSWORD);
      const answered = post(buyerAtA, `/api/price-lists/${current.id}/commit`).then(
        (r) => r.status,
        () => 'cut',
      );
      await waitForCommitLock(ds, appNameOfA(round));
      // Inside the commit's transaction (it holds the list's lock): kill at some point of it.
      await sleep(random() * commitMs * 0.5);
      await a.kill();
      await waitForBackendsGone(ds, appNameOfA(round));

      const state = await listState(ds, current.id);
      // A commit that answered 200 before the kill is committed; one cut by it may be either.
      if ((await answered) === 200) expect(state.status, `round ${round}`).toBe('committed');
      if (state.status === 'committed') {
        expect(isFullyCommitted(state), `round ${round}: ${JSON.stringify(state)}`).toBe(true);
        expect(state.pricesMatching).toBe(ROWS);
        outcomes.committed++;
        lastCommitted = current;
      } else {
        expect(isUntouched(state), `round ${round}: ${JSON.stringify(state)}`).toBe(true);
        const previous = await listState(ds, lastCommitted.id);
        expect(previous.pricesFromList).toBe(ROWS);
        expect(previous.pricesMatching).toBe(ROWS);
        outcomes.untouched++;
      }
    }
    watch.stop = true;
    await watching;
    console.log(
      `two servers: ${KILLS} kills of A, ${outcomes.committed} commits whole, ${outcomes.untouched} not at all; B probed ${watch.probes} times`,
    );
    expect(watch.failures).toEqual([]);
    expect(watch.probes).toBeGreaterThan(10);
    // At least one kill landed before the commit's end and was rolled back.
    expect(outcomes.untouched).toBeGreaterThan(0);
  }, 180_000);

  it('B and the worker stop cleanly on SIGTERM (exit 0)', async () => {
    expect((await request(worker.url).get('/healthz').expect(200)).body).toEqual({ status: 'ok' });
    expect((await request(worker.url).get('/readyz').expect(200)).body.status).toBe('ready');
    expect((await request(worker.url).get('/metrics').expect(200)).text).toContain('arcwise_job_queue_jobs{');
    b.signal('SIGTERM');
    worker.signal('SIGTERM');
    expect(await b.exited).toEqual({ code: 0, signal: null });
    expect(await worker.exited).toEqual({ code: 0, signal: null });
  }, 60_000);
});

/** Waits until one of the app's connections holds an advisory lock: the commit's transaction has begun. */
async function waitForCommitLock(ds: DataSource, appName: string): Promise<void> {
  await vi.waitFor(
    async () => {
      const rows = (await ds.query(
        `SELECT count(*)::int AS n FROM pg_locks l JOIN pg_stat_activity s ON s.pid = l.pid
          WHERE s.application_name = $1 AND l.locktype = 'advisory' AND l.granted`,
        [appName],
      )) as { n: number }[];
      if ((rows[0]?.n ?? 0) === 0) throw new Error(`${appName} holds no commit lock yet`);
    },
    { timeout: 30_000, interval: 5 },
  );
}
