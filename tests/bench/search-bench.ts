import { spawn } from 'node:child_process';
import autocannon from 'autocannon';
import pg from 'pg';
import { normalizePartNumber } from '../../shared/part-number';
import { scaleForeignNumber, scalePartNumber } from '../../seed/scale';
import { fmt, summarise, type LatencySummary } from './stats';

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
    child.stdout.on('data', (d: Buffer) => {
      buf += d.toString();
      const m = /READY [^\n]*\n/.exec(buf);
      if (m) resolve(m[0]);
    });
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
  const words = ['iridium spark plug', 'pencil coil', 'coil pack', 'platinum', 'scale coil 4211', 'copper plug'];
  const numberPaths = numbers.map((q) => `/api/search?q=${encodeURIComponent(q)}&limit=20`);
  const textPaths = words.map((q) => `/api/search?q=${encodeURIComponent(q)}&limit=20`);

  const byNumber = await load(base, cookie, numberPaths);
  const byText = await load(base, cookie, textPaths);
  const sql = await sqlLookup(databaseUrl, numbers);
  const row = (name: string, s: LatencySummary) =>
    `  ${name.padEnd(26)} p50 ${fmt(s.p50).padStart(10)}  p95 ${fmt(s.p95).padStart(10)}  p99 ${fmt(s.p99).padStart(10)}  ${s.perSecond.toFixed(0).padStart(6)} req/s`;
  console.log(`\nSearch, ${CONNECTIONS} concurrent clients, ${SECONDS} s each, ${indexed} parts indexed`);
  console.log(row('GET /api/search numbers', byNumber));
  console.log(row('GET /api/search text', byText));
  console.log(row('bare SQL number lookup', sql));
  console.log(`  ratio p95 numbers / SQL: ${(byNumber.p95 / sql.p95).toFixed(2)} × (goal ≤ 3 ×, p95 ≤ 25 ms)`);

  srv.stop();
}
