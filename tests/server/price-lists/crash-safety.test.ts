import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PriceList } from '../../../shared/schemas/price-lists';
import type { Supplier } from '../../../shared/schemas/suppliers';
import { backends, waitForBackendsGone } from '../../helpers/backends';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { newSupplier, post, stage, type Signed } from '../../helpers/price-list-api';
import { isFullyCommitted, isUntouched, listState } from '../../helpers/price-list-checks';
import { bulkCsv, bulkRows, runTag, seededRandom } from '../../helpers/price-list-files';
import { testServicesEnv } from '../../helpers/services-env';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

const ROWS = 20_000;
const KILLS = 20;
const CHILD = fileURLToPath(new URL('../../helpers/price-list-crash-server.ts', import.meta.url));
const ROOT = fileURLToPath(new URL('../../..', import.meta.url));

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

interface Child {
  appName: string;
  /** Resolves once the child has booted and signed in. */
  ready: Promise<void>;
  /** Hands the child the list to commit; resolves as it sends the request. */
  commit(listId: string): Promise<void>;
  /** Resolves with the commit's HTTP status when it answered (before the kill). */
  answered: Promise<number>;
  kill(): Promise<void>;
}

function startChild(email: string, appName: string): Child {
  // One node process (no npx wrapper), leading its own process group, so SIGKILL reaches all of it.
  const child = spawn(process.execPath, ['--import', 'tsx', CHILD], {
    cwd: ROOT,
    detached: true,
    stdio: ['pipe', 'pipe', 'pipe'],
    env: {
      ...process.env,
      ...testServicesEnv(),
      TSX_TSCONFIG_PATH: `${ROOT}/tsconfig.json`,
      // node-postgres names its connections after this, so the test can see them go.
      PGAPPNAME: appName,
      CRASH_EMAIL: email,
      CRASH_PASSWORD: TEST_PASSWORD,
    },
  });
  let out = '';
  let err = '';
  const waiters: { word: string; resolve: () => void }[] = [];
  const exited = new Promise<void>((resolve) => child.on('exit', () => resolve()));
  const until = (word: string): Promise<void> =>
    new Promise((resolve, reject) => {
      if (out.includes(word)) return resolve();
      waiters.push({ word, resolve });
      void exited.then(() => reject(new Error(`crash child ${appName} ended before "${word}": ${err}`)));
    });
  child.stdout?.on('data', (d: Buffer) => {
    out += d.toString();
    for (const w of waiters) if (out.includes(w.word)) w.resolve();
  });
  child.stderr?.on('data', (d: Buffer) => (err += d.toString()));
  const answered = until('done').then(() => Number(/done (\d+)/.exec(out)?.[1]));
  return {
    appName,
    ready: until('ready'),
    commit(listId) {
      child.stdin?.write(`${listId}\n`);
      return until('committing');
    },
    answered,
    async kill() {
      process.kill(-(child.pid ?? 0), 'SIGKILL');
      await exited;
    },
  };
}

describe('a server killed during a commit', () => {
  let t: TestApp;
  let buyer: Signed;
  let email: string;
  let supplier: Supplier;

  beforeAll(async () => {
    t = await createTestApp();
    const u = await makeUser(t.deps.dataSource, 'buyer');
    email = u.email;
    buyer = await signIn(t.app, u.email, TEST_PASSWORD);
    supplier = await newSupplier(buyer, 'Crash');
  });
  afterAll(() => t.close());

  // Twenty kills and restarts of a server process take minutes on a loaded two-core machine.
  it(`leaves each of ${KILLS} lists of ${ROWS.toLocaleString('en-US')} rows either committed whole or not at all`, async () => {
    const ds = t.deps.dataSource;
    const tag = runTag();
    const random = seededRandom(5);
    let version = 0;
    const stageVersion = (): Promise<PriceList> => stage(buyer, { supplierId: supplier.id, file: bulkCsv(bulkRows(tag, ROWS, version++)) });

    // The first list creates the parts; committed here, it also shows how long a commit takes.
    let lastCommitted = await stageVersion();
    const started = performance.now();
    expect((await post(buyer, `/api/price-lists/${lastCommitted.id}/commit`)).status).toBe(200);
    let commitMs = (performance.now() - started) * 1.5;
    // The check below knows a whole commit when it sees one.
    expect(isFullyCommitted(await listState(ds, lastCommitted.id))).toBe(true);

    let current = await stageVersion();
    const outcomes = { committed: 0, untouched: 0, connectionsSeen: 0 };
    let next = startChild(email, `arcwise-crash-${tag}-0`);
    for (let i = 0; i < KILLS; i++) {
      const child = next;
      await child.ready;
      // The next server boots while this one commits, to keep the test short.
      if (i + 1 < KILLS) next = startChild(email, `arcwise-crash-${tag}-${i + 1}`);
      await child.commit(current.id);
      const sentAt = performance.now();
      if ((await backends(t.deps.dataSource, child.appName)) > 0) outcomes.connectionsSeen++;
      let answeredAfter: number | null = null;
      let answeredStatus: number | null = null;
      child.answered.then(
        (status) => {
          answeredAfter = performance.now() - sentAt;
          answeredStatus = status;
        },
        () => undefined,
      );
      await sleep(random() * commitMs);
      await child.kill();
      await waitForBackendsGone(t.deps.dataSource, child.appName);
      // The window follows the commit's length: a commit that finished before the kill tells it;
      // a kill that came first widens the window a little, so later kills reach the end too.
      commitMs = answeredAfter ?? commitMs * 1.1;
      // A commit that answered before the kill was a real one, not a refusal.
      if (answeredStatus !== null) expect(answeredStatus, `kill ${i}`).toBe(200);

      const state = await listState(ds, current.id);
      if (state.status === 'committed') {
        expect(isFullyCommitted(state), `kill ${i}: ${JSON.stringify(state)}`).toBe(true);
        expect(state.pricesMatching).toBe(ROWS);
        outcomes.committed++;
        lastCommitted = current;
        current = await stageVersion();
      } else {
        expect(isUntouched(state), `kill ${i}: ${JSON.stringify(state)}`).toBe(true);
        // The supplier's prices are still those of the last list committed, every one of them.
        const previous = await listState(ds, lastCommitted.id);
        expect(previous.pricesFromList).toBe(ROWS);
        expect(previous.pricesMatching).toBe(ROWS);
        outcomes.untouched++;
      }
    }
    console.log(`crash safety: ${KILLS} kills, ${outcomes.committed} commits whole, ${outcomes.untouched} not at all`);
    // Kills landed inside commits, and the wait for the dead server's connections watched real ones.
    expect(outcomes.untouched).toBeGreaterThan(0);
    expect(outcomes.connectionsSeen).toBe(KILLS);
  }, 400_000);
});
