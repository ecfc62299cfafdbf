import { spawn } from 'node:child_process';
import autocannon from 'autocannon';
import pg from 'pg';
import { normalizePartNumber } from '../../shared/part-number';
import { scaleForeignNumber, scalePartNumber } from '../../seed/scale';
import { JUDGED_QUERIES, reciprocalRank } from '../helpers/judged-queries';
import { fmt, summarise, type LatencySummary } from './stats';
import { prepareTextAnchor, textAnchorLoad } from './text-anchor';

const CONNECTIONS = 20;
const SECONDS = 10;

async function load(url: string, cookie: string, paths: string[]): Promise<LatencySummary> {
  const latencies: number[] = [];
  let n = 0;
  const instance = autocannon({
    url,
    connections: CONNECTIONS,
    duration: SECONDS,
    headers: { cookie },
    requests: [{ setupRequest: (req) => ({ ...req, path: paths[n++ % paths.length]! }) }],
    setupClient: (client) => {
      client.on('response', (status: number, _bytes: number, ms: number) => {
        if (status !== 200) throw new Error(`search answered ${status}`);
        latencies.push(ms);
      });
    },
  });
  await instance;
  return summarise(latencies, SECONDS);
}

/** The same numbers, looked up by a bare indexed SQL query over 20 connections, for the ratio. */
async function sqlLookup(url: string, numbers: string[]): Promise<LatencySummary> {
  const pool = new pg.Pool({ connectionString: url, max: CONNECTIONS });
  const latencies: number[] = [];
  const deadline = Date.now() + SECONDS * 1000;
  let n = 0;
  const worker = async () => {
    const client = await pool.connect();
    try {
      while (Date.now() < deadline) {
        const q = normalizePartNumber(numbers[n++ % numbers.length]!);
        const t0 = performance.now();
        await client.query(
          `SELECT p.id, p.part_number FROM part p WHERE p.part_number_norm = $1
           UNION SELECT p.id, p.part_number FROM interchange i JOIN part p ON p.id = i.part_id WHERE i.foreign_number_norm = $1 LIMIT 20`,
          [q],
        );
        latencies.push(performance.now() - t0);
      }
    } finally {
      client.release();
    }
  };
  await Promise.all(Array.from({ length: CONNECTIONS }, worker));
  await pool.end();
  return summarise(latencies, SECONDS);
}

/** Starts tests/bench/bench-server.ts in a child process and waits for its port. */
async function startServer(): Promise<{ base: string; indexed: number; indexMs: number; stop(): void }> {
  // Its own process group, so stopping it stops the node process under npx too.
  const child = spawn('npx', ['tsx', 'tests/bench/bench-server.ts'], {
    stdio: ['ignore', 'pipe', 'inherit'],
    env: process.env,
    detached: true,
  });
  const line = await new Promise<string>((resolve, reject) => {
    let buf = '';
    const onData = (d: Buffer) => {
      buf += d.toString();
      const m = /READY [^\n]*\n/.exec(buf);
      if (!m) return;
      // Then its request log is drained unread: kept, it would cost the load generator's CPU.
      child.stdout.off('data', onData);
      child.stdout.resume();
      resolve(m[0]);
    };
    child.stdout.on('data', onData);
    child.once('exit', (code) => reject(new Error(`bench server exited with ${code}`)));
  });
  const [, port, indexed, ms] = line.trim().split(' ');
  return {
    base: `http://127.0.0.1:${port}`,
    indexed: Number(indexed),
    indexMs: Number(ms),
    stop: () => process.kill(-child.pid!, 'SIGTERM'),
  };
}

/**
 * What clerks type as words, from plain to specific, a few with a typo: the same list for the app
 * and for the PostgreSQL anchor. Every one matches parts of the scale data set.
 */
const TEXT_QUERIES = [
  'iridium spark plug',
  'pencil coil',
  'coil pack',
  'platinum plug',
  'copper plug',
  'scale coil 4211',
  '4 pin coil',
  'plug 14 mm 19 reach',
  'canister coil',
  'coil on plug',
  'waste spark coil pack',
  'double platinum',
  'taper seat plug',
  'fine wire iridium',
  'ballast resistor coil',
  'pensil coil',
  'iridum plug',
  'Solenne Marivo',
  'Kaymor Nimbo plug',
  'scale spark plug iridium 17',
];

/** The judged set (tests/helpers/judged-queries.ts) against this server, one query at a time. */
async function meanReciprocalRank(base: string, cookie: string): Promise<number> {
  let sum = 0;
  for (const j of JUDGED_QUERIES) {
    const res = await fetch(`${base}/api/search?q=${encodeURIComponent(j.q)}&limit=10`, { headers: { cookie } });
    const body = (await res.json()) as { hits: { partNumber: string }[] };
    sum += reciprocalRank(
      body.hits.map((h) => h.partNumber),
      j.expect,
    );
  }
  return sum / JUDGED_QUERIES.length;
}

export async function runSearchBench(): Promise<void> {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('DATABASE_URL is not set (npm run bench sets it)');
  const srv = await startServer();
  const { base, indexed } = srv;
  console.log(`  index rebuilt from PostgreSQL: ${indexed} documents in ${(srv.indexMs / 1000).toFixed(1)} s`);
  const csrf = await fetch(`${base}/api/auth/csrf`);
  const csrfCookie = csrf.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const { token } = (await csrf.json()) as { token: string };
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': token, cookie: csrfCookie },
    body: JSON.stringify({ email: 'clerk@harborlane.test', password: 'arcwise-demo' }),
  });
  const cookie = login.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');

  const numbers: string[] = [];
  for (let i = 0; i < 400; i++) {
    const k = (i * 7919) % 100_000;
    numbers.push(i % 2 ? scalePartNumber(k) : scaleForeignNumber(k, i % 3));
  }
  const numberPaths = numbers.map((q) => `/api/search?q=${encodeURIComponent(q)}&limit=20`);
  const textPaths = TEXT_QUERIES.map((q) => `/api/search?q=${encodeURIComponent(q)}&limit=20`);

  await prepareTextAnchor(databaseUrl);
  const byNumber = await load(base, cookie, numberPaths);
  const sql = await sqlLookup(databaseUrl, numbers);
  const byText = await load(base, cookie, textPaths);
  const anchor = await textAnchorLoad(databaseUrl, TEXT_QUERIES, CONNECTIONS, SECONDS);
  const row = (name: string, s: LatencySummary) =>
    `  ${name.padEnd(34)} p50 ${fmt(s.p50).padStart(10)}  p95 ${fmt(s.p95).padStart(10)}  p99 ${fmt(s.p99).padStart(10)}  ${s.perSecond.toFixed(0).padStart(6)} req/s`;
  console.log(`\nSearch, ${CONNECTIONS} concurrent clients, ${SECONDS} s each, ${indexed} parts indexed`);
  console.log(row('GET /api/search numbers', byNumber));
  console.log(row('bare SQL number lookup', sql));
  console.log(row('GET /api/search text', byText));
  console.log(row('PostgreSQL text (tsvector + pg_trgm)', anchor));
  console.log(`  ratio p95 numbers / SQL: ${(byNumber.p95 / sql.p95).toFixed(2)} × (goal ≤ 3 ×)`);
  console.log(`  ratio p95 text / PostgreSQL text: ${(byText.p95 / anchor.p95).toFixed(2)} × (goal ≤ 3 ×)`);
  console.log(
    `  judged queries (${JUDGED_QUERIES.length}) on this data, as a clerk: mean reciprocal rank ${(await meanReciprocalRank(base, cookie)).toFixed(3)} (goal ≥ 0.9)`,
  );

  srv.stop();
}
