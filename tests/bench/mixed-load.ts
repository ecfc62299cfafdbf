import { spawn, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { scaleForeignNumber, scalePartNumber } from '../../seed/scale';
import { createDataSource } from '../../server/db/data-source';
import { removeBenchData, writeSupplierFile } from './price-list-import';
import { fmt, summarise, type LatencySummary } from './stats';

/**
 * Issue 11's load figure: 20 concurrent clients mixing searches (numbers and words), coil
 * compares and part details for MIXED_LOAD_SECONDS (60 s by default), while one buyer imports a
 * price list (upload → map → preview → commit) — against one app server, then two behind a
 * round-robin client, all sharing one database and one search stand-in process. The clients are
 * a plain loop over fetch: the mix needs a session and a CSRF token per client, which is our adapter.
 */
const CLIENTS = 20;
const SECONDS = Number(process.env.MIXED_LOAD_SECONDS || 60);
const IMPORT_ROWS = 3_000;
const WORDS = ['iridium spark plug', 'pencil coil', 'coil pack', '4 pin coil', 'plug 14 mm 19 reach', 'fine wire iridium', 'pensil coil'];

interface Proc {
  child: ChildProcess;
  stop(): void;
}

/** A child process in its own group (so stopping it stops what it started), resolved with the first match of `ready` in its stdout. */
function startProcess(args: string[], env: NodeJS.ProcessEnv, ready: RegExp): Promise<{ proc: Proc; match: RegExpExecArray }> {
  const child = spawn(process.execPath, ['--import', 'tsx', ...args], { env, detached: true, stdio: ['ignore', 'pipe', 'inherit'] });
  const proc = { child, stop: () => process.kill(-child.pid!, 'SIGTERM') };
  return new Promise((resolve, reject) => {
    let buf = '';
    const onData = (d: Buffer) => {
      buf += d.toString();
      const match = ready.exec(buf);
      if (!match) return;
      // Then its request log is drained unread.
      child.stdout!.off('data', onData);
      child.stdout!.resume();
      resolve({ proc, match });
    };
    child.stdout!.on('data', onData);
    child.once('exit', (code) => reject(new Error(`${args.join(' ')} exited with ${code}:\n${buf}`)));
  });
}

/** A signed-in browser's cookies and CSRF token against one server. */
class Session {
  private jar = new Map<string, string>();
  token = '';
  constructor(readonly base: string) {}
  private keep(res: Response): void {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';');
      const eq = pair!.indexOf('=');
      this.jar.set(pair!.slice(0, eq), pair!.slice(eq + 1));
    }
  }
  headers(json = true): Record<string, string> {
    const cookie = [...this.jar].map(([k, v]) => `${k}=${v}`).join('; ');
    return { cookie, 'x-csrf-token': this.token, ...(json ? { 'content-type': 'application/json' } : {}) };
  }
  /** `base`: another server of the same database, where the same session is valid. */
  async fetch(path: string, init: RequestInit = {}, base = this.base): Promise<Response> {
    const res = await fetch(`${base}${path}`, {
      ...init,
      headers: { ...this.headers(!(init.body instanceof FormData)), ...init.headers },
    });
    this.keep(res);
    return res;
  }
  private async refreshToken(): Promise<void> {
    this.token = ((await (await this.fetch('/api/auth/csrf')).json()) as { token: string }).token;
  }
  async signIn(email: string): Promise<this> {
    await this.refreshToken();
    const res = await this.fetch('/api/auth/login', { method: 'POST', body: JSON.stringify({ email, password: 'arcwise-demo' }) });
    if (!res.ok) throw new Error(`sign-in of ${email} answered ${res.status}`);
    await this.refreshToken();
    return this;
  }
}

async function okJson<T>(res: Response, what: string): Promise<T> {
  if (!res.ok) throw new Error(`${what} answered ${res.status}: ${await res.text()}`);
  return (await res.json()) as T;
}

/** Upload → map (the guessed mapping sent back) → preview → commit of a new supplier's file. */
interface Imported {
  ms: number;
  supplierId: string;
  listId: string;
}

async function importPriceList(buyer: Session, file: string): Promise<Imported> {
  const t0 = performance.now();
  const supplier = await okJson<{ supplier: { id: string } }>(
    await buyer.fetch('/api/suppliers', { method: 'POST', body: JSON.stringify({ name: `Load supplier ${randomUUID().slice(0, 8)}` }) }),
    'supplier',
  );
  const form = new FormData();
  form.set('supplierId', supplier.supplier.id);
  form.set('file', new Blob([await readFile(file)], { type: 'text/csv' }), 'prices.csv');
  const list = await okJson<{ id: string; mapping: object }>(
    await buyer.fetch('/api/price-lists', { method: 'POST', body: form }),
    'upload',
  );
  await okJson(
    await buyer.fetch(`/api/price-lists/${list.id}/preview`, { method: 'POST', body: JSON.stringify({ mapping: list.mapping }) }),
    'preview',
  );
  await okJson(await buyer.fetch(`/api/price-lists/${list.id}/commit`, { method: 'POST', body: '{}' }), 'commit');
  return { ms: performance.now() - t0, supplierId: supplier.supplier.id, listId: list.id };
}

interface Mix {
  numbers: string[];
  coils: string[];
  engines: string[];
  parts: string[];
}

async function loadMix(databaseUrl: string): Promise<Mix> {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const ids = async (sql: string) => (await client.query<{ id: string }>(sql)).rows.map((r) => r.id);
    const numbers = Array.from({ length: 400 }, (_, i) => {
      const k = (i * 7919) % 100_000;
      return i % 2 ? scalePartNumber(k) : scaleForeignNumber(k, i % 3);
    });
    return {
      numbers,
      coils: await ids(`SELECT part_id AS id FROM coil_spec ORDER BY part_id LIMIT 200`),
      engines: await ids(`SELECT id FROM engine ORDER BY id LIMIT 20`),
      parts: await ids(`SELECT id FROM part ORDER BY id LIMIT 1000`),
    };
  } finally {
    await client.end();
  }
}

/** One request of the mix, by turn: number search, word search, compare, part detail. */
function request(mix: Mix, n: number): { path: string; init?: RequestInit } {
  const pick = <T>(xs: T[]) => xs[(n * 7919) % xs.length]!;
  switch (n % 4) {
    case 0:
      return { path: `/api/search?q=${encodeURIComponent(pick(mix.numbers))}&limit=20` };
    case 1:
      return { path: `/api/search?q=${encodeURIComponent(pick(WORDS))}&limit=20` };
    case 2: {
      const body = {
        original: { partId: pick(mix.coils) },
        substitute: { partId: mix.coils[(n * 31) % mix.coils.length] },
        engine: { engineId: pick(mix.engines) },
      };
      return { path: '/api/compat/coil', init: { method: 'POST', body: JSON.stringify(body) } };
    }
    default:
      return { path: `/api/parts/${pick(mix.parts)}` };
  }
}

const KINDS = ['number search', 'word search', 'coil compare', 'part detail'] as const;

interface RunFigures {
  summary: LatencySummary;
  /** p95 by kind of request (the order of KINDS). */
  kindP95: number[];
  errors: number;
  firstError?: string;
  importMs: number;
  imported?: Imported;
}

async function runMix(bases: string[], mix: Mix, file: string): Promise<RunFigures> {
  // One clerk's session (sessions live in PostgreSQL: valid on every server) for all the clients.
  const clerk = await new Session(bases[0]!).signIn('clerk@harborlane.test');
  const buyer = await new Session(bases[0]!).signIn('buyer@harborlane.test');
  const latencies: number[] = [];
  const byKind: number[][] = KINDS.map(() => []);
  let errors = 0;
  let firstError: string | undefined;
  let n = 0;
  let turn = 0;
  const deadline = Date.now() + SECONDS * 1000;
  const importing = importPriceList(buyer, file);
  await Promise.all(
    Array.from({ length: CLIENTS }, async () => {
      while (Date.now() < deadline) {
        const base = bases[turn++ % bases.length]; // round robin over the servers
        const i = n++;
        const { path, init } = request(mix, i);
        const t0 = performance.now();
        try {
          const res = await clerk.fetch(path, init, base);
          await res.arrayBuffer();
          if (!res.ok) {
            errors++;
            firstError ??= `${init?.method ?? 'GET'} ${path} → ${res.status}`;
          }
        } catch (err) {
          errors++;
          firstError ??= `${path}: ${String(err)}`;
        }
        latencies.push(performance.now() - t0);
        byKind[i % KINDS.length]!.push(performance.now() - t0);
      }
    }),
  );
  const imported = await importing.catch((err: unknown) => {
    errors++;
    firstError ??= `import: ${String(err)}`;
    return undefined;
  });
  return {
    summary: summarise(latencies, SECONDS),
    kindP95: byKind.map((l) => summarise(l, SECONDS).p95),
    errors,
    firstError,
    importMs: imported?.ms ?? NaN,
    imported,
  };
}

async function documentsIn(standin: string): Promise<number> {
  const res = await fetch(`${standin}/indexes/parts/stats`).catch(() => null);
  return res?.ok ? ((await res.json()) as { numberOfDocuments: number }).numberOfDocuments : 0;
}

async function waitForIndex(standin: string, parts: number): Promise<void> {
  const deadline = Date.now() + 10 * 60_000;
  while ((await documentsIn(standin)) < parts) {
    if (Date.now() > deadline) throw new Error('the shared index was not rebuilt within 10 minutes');
    await new Promise((r) => setTimeout(r, 2_000));
  }
}

export async function runMixedLoadBench(databaseUrl: string): Promise<void> {
  const procs: Proc[] = [];
  const runs: RunFigures[] = [];
  const dir = await mkdtemp(join(tmpdir(), 'arcwise-mixed-load-'));
  try {
    const standinRun = await startProcess(
      ['server/search-standin/main.ts'],
      { ...process.env, MEILI_PORT: '0', MEILI_MASTER_KEY: '' },
      /search stand-in \(Meilisearch API\) on (http:\/\/[^\s,]+)/,
    );
    procs.push(standinRun.proc);
    const standin = standinRun.match[1]!;
    const appEnv = (workers: boolean): NodeJS.ProcessEnv => ({
      ...process.env,
      NODE_ENV: 'production',
      DATABASE_URL: databaseUrl,
      MEILI_HOST: standin,
      HOST: '127.0.0.1',
      PORT: '0',
      WORKER_PORT: '0',
      SESSION_SECRET: 'arcwise-bench-secret-0123456789',
      LOGIN_MAX_PER_CLIENT: '1000',
      JOB_WORKERS: workers ? '1' : '0',
    });
    const startApp = async (workers: boolean): Promise<string> => {
      const run = await startProcess(['server/index.ts'], appEnv(workers), /listening on http:\/\/localhost:(\d+)/);
      procs.push(run.proc);
      return `http://127.0.0.1:${run.match[1]}`;
    };
    // The first server finds the shared index empty and queues its rebuild; its workers run it.
    const first = await startApp(true);
    const parts = await new pg.Client({ connectionString: databaseUrl });
    await parts.connect();
    const ours = Number(
      (await parts.query<{ n: string }>(`SELECT count(*) AS n FROM part p JOIN brand b ON b.id = p.brand_id AND b.ours`)).rows[0]!.n,
    );
    await parts.end();
    const t0 = Date.now();
    await waitForIndex(standin, ours);
    console.log(`  shared stand-in index rebuilt through the job queue: ${ours} parts in ${((Date.now() - t0) / 1000).toFixed(0)} s`);
    const mix = await loadMix(databaseUrl);
    const files = [join(dir, 'one.csv'), join(dir, 'two.csv')];
    for (const [i, f] of files.entries()) await writeSupplierFile(f, `ML${randomUUID().slice(0, 6).toUpperCase()}${i}`, IMPORT_ROWS);

    const one = await runMix([first], mix, files[0]!);
    runs.push(one);
    const second = await startApp(false);
    const two = await runMix([first, second], mix, files[1]!);
    runs.push(two);

    const row = (name: string, f: RunFigures) =>
      `  ${name.padEnd(30)} ${f.summary.perSecond.toFixed(0).padStart(6)} req/s  p50 ${fmt(f.summary.p50).padStart(10)}  p95 ${fmt(f.summary.p95).padStart(10)}  p99 ${fmt(f.summary.p99).padStart(10)}  errors ${f.errors}  import ${(f.importMs / 1000).toFixed(1)} s`;
    console.log(
      `\nMixed load, ${CLIENTS} concurrent clients, ${SECONDS} s each (searches by number and words, coil compares, part details), ` +
        `one ${IMPORT_ROWS.toLocaleString('en-US')}-row price-list import (upload, map, preview, commit) running:`,
    );
    console.log(row('one app server', one));
    console.log(row('two app servers, round-robin', two));
    for (const [name, f] of [
      ['one', one],
      ['two', two],
    ] as const)
      console.log(`  p95 by request, ${name}: ${KINDS.map((k, i) => `${k} ${fmt(f.kindP95[i]!)}`).join(', ')}`);
    for (const f of [one, two]) if (f.firstError) console.log(`  first error: ${f.firstError}`);
  } finally {
    for (const p of procs.reverse()) p.stop();
    // The imports' new parts, lists and suppliers go, so the next run measures the same data.
    const ds = await createDataSource(databaseUrl).initialize();
    for (const { imported } of runs) if (imported) await removeBenchData(ds, imported.supplierId, [imported.listId]);
    await ds.destroy();
    await rm(dir, { recursive: true, force: true });
  }
}
