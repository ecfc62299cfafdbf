/**
 * Benchmark: the search stand-in holding 100,000 part documents shaped like the app's
 * PartDocument (server/search/part-document.ts), indexed with the app's settings through the real
 * `meilisearch` SDK, then searched over HTTP with the queries server/services/search.service.ts
 * sends: free text (filter `current = true`, facets kind and brand), number tokens (no facets),
 * spec searches (empty q, filters, all 11 facets). For every query type it prints p50/p95 of the
 * round trip with 1 client and with 20 concurrent clients, then the engine's CPU time per search
 * when called in-process.
 *
 * The stand-in runs in a child process of its own, so the load generator does not share its event
 * loop (it still shares the machine's cores, as the app would). Run with
 * `npx tsx tests/bench/standin-search.ts`. Environment:
 *   STANDIN_ENTRY      the stand-in's main.ts to run (default server/search-standin/main.ts), to
 *                      compare against another copy of it
 *   STANDIN_NODE_ARGS  extra node flags for the stand-in process, e.g. `--cpu-prof --cpu-prof-dir=/tmp/prof`
 *   BENCH_ONLY         comma-separated query types to run (default: all)
 *   BENCH_SCALE        multiplies the number of searches per type (default 1)
 *   BENCH_ENGINE=0     skips the in-process engine timings that follow the HTTP figures
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { realpathSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Meilisearch } from 'meilisearch';
import type { PartDocument } from '../../server/search/part-document';
import { FACET_ATTRIBUTES, FILTERABLE_ATTRIBUTES, SEARCHABLE_ATTRIBUTES } from '../../server/search/part-document';

const DOCUMENTS = 100_000;
const BATCH = 10_000;
const CONCURRENCY = 20;
const UID = 'bench_parts';
const HERE = dirname(fileURLToPath(import.meta.url));
const ROOT = resolve(HERE, '../..');

/** mulberry32: a small seeded generator, so every run indexes the same documents. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

const BRANDS = ['Benchline', 'Orvane', 'Telrix', 'Quillon', 'Brastow', 'Kemlar', 'Vonteq', 'Halvex'];
const FOREIGN_PREFIXES = ['FW', 'GP', 'HM'];
const COIL_STYLES = ['coil-on-plug', 'pencil', 'coil pack'];
const ELECTRODES = ['copper', 'platinum', 'iridium'];
const ARCHITECTURES = ['coil-on-plug', 'pencil', 'coil-pack', 'canister'];
const MAKES: Array<[string, string[]]> = [
  ['Honda', ['Civic', 'Accord', 'Jazz']],
  ['Toyota', ['Corolla', 'Yaris', 'Avensis']],
  ['Ford', ['Focus', 'Fiesta', 'Mondeo']],
  ['Volkswagen', ['Golf', 'Polo', 'Passat']],
  ['BMW', ['320i', '520i', 'X3']],
  ['Subaru', ['Impreza', 'Legacy', 'Forester']],
];
const ENGINE_CODES = Array.from({ length: 60 }, (_, k) => `${'KBEJNMRZ'[k % 8]}${10 + ((k * 7) % 50)}${'ABCDE'[k % 5]}`);

const pad = (n: number, width: number): string => String(n).padStart(width, '0');

/** The document seed/scale.ts's part i becomes: "BL-C 004210" is number BLC004210, and so on. */
function partDocument(i: number, random: () => number): PartDocument {
  const pick = <T>(list: readonly T[]): T => list[Math.floor(random() * list.length)] as T;
  const kind: 'coil' | 'plug' = i % 2 ? 'plug' : 'coil';
  const letter = kind === 'plug' ? 'P' : 'C';
  const engineCodes = [...new Set(Array.from({ length: 1 + Math.floor(random() * 3) }, () => pick(ENGINE_CODES)))];
  const vehicles = engineCodes.map((code) => {
    const [make, models] = pick(MAKES);
    const from = 1995 + Math.floor(random() * 20);
    return `${make} ${pick(models)} ${code} ${from}-${from + 1 + Math.floor(random() * 8)}`;
  });
  // Every hundredth part is superseded by the one two before it (same kind), which lists its number.
  const supersededNumbers = (i + 2) % 100 === 0 && i + 2 < DOCUMENTS ? [`BL${letter}${pad(i + 2, 6)}`] : [];
  const onHand = i % 4 ? (i * 7) % 23 : 0;
  const j = Math.floor(i / 2);
  const coil = kind === 'coil';
  const lo = 0.3 + random() * 0.6;
  const [threadMm, reachMm, hexMm] = (
    [
      [14, 19, 16],
      [12, 26.5, 14],
      [10, 19, 16],
    ] as const
  )[j % 3] as readonly [number, number, number];
  return {
    id: `part-${pad(i, 6)}`,
    brand: i % 3 === 0 ? 'Benchline' : pick(BRANDS),
    partNumber: `BL-${letter} ${pad(i, 6)}`,
    number: `BL${letter}${pad(i, 6)}`,
    gtin: i % 3 === 1 ? `40${pad(i, 11)}` : null,
    kind,
    description: coil ? `Scale coil ${COIL_STYLES[i % 3]} ${i}` : `Scale spark plug ${ELECTRODES[i % 3]} ${i}`,
    interchangeNumbers: FOREIGN_PREFIXES.map((prefix, k) => `${prefix}${(i * 7 + k * 13) % 1000}${pad(i, 6)}`),
    supersededNumbers,
    engineCodes,
    vehicles,
    current: i % 100 !== 98,
    hasSpec: true,
    onHand,
    inStock: onHand > 0,
    architecture: coil ? (ARCHITECTURES[j % 4] as string) : null,
    driver: coil ? (j % 5 ? 'integrated' : 'external') : null,
    connectorPins: coil ? 3 + (j % 2) : null,
    connectorKey: coil ? ('ABCDE'[j % 5] as string) : null,
    primaryOhmMin: coil ? Math.round(lo * 100) / 100 : null,
    primaryOhmMax: coil ? Math.round((lo + 0.15) * 100) / 100 : null,
    threadMm: coil ? null : threadMm,
    reachMm: coil ? null : reachMm,
    seat: coil ? null : j % 4 ? 'flat' : 'taper',
    hexMm: coil ? null : hexMm,
    heatStep: coil ? null : 4 + (j % 6),
    resistor: coil ? null : j % 7 !== 0,
    gapMm: coil ? null : Math.round((0.7 + (j % 5) * 0.1) * 10) / 10,
  };
}

export function partDocuments(count: number, random: () => number): PartDocument[] {
  return Array.from({ length: count }, (_, i) => partDocument(i, random));
}

/** A one-character substitution after the first letter, so Meilisearch's typo rule allows it. */
function withOneTypo(word: string, at: number): string {
  const replacement = word[at] === '7' ? '3' : '7';
  return word.slice(0, at) + replacement + word.slice(at + 1);
}

function percentile(sorted: readonly number[], p: number): number {
  const index = Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1);
  return sorted[Math.max(0, index)] ?? Number.NaN;
}

/** A search body as search.service.ts sends it (limit 20, offset 0, `current = true` first). */
export type SearchBody = { q: string; filter: string[]; facets: string[]; limit: number; offset: number };

export interface QueryType {
  name: string;
  /** The body of the k-th search of this type. */
  make: (k: number) => SearchBody;
  /** Searches per client count; fewer for the slow ones so a run stays within minutes. */
  searches: number;
}

const TEXT_QUERIES = ['iridium spark plug', 'pencil coil', 'coil pack', 'platinum', 'copper plug'];
const body = (q: string, filter: string[], facets: string[]): SearchBody => ({
  q,
  filter: ['current = true', ...filter],
  facets,
  limit: 20,
  offset: 0,
});
const someCurrentPart = (k: number): number => {
  const i = (k * 7_919 + 13) % DOCUMENTS;
  return i % 100 === 98 ? i + 1 : i;
};
const numberOf = (i: number): string => `BL${i % 2 ? 'P' : 'C'}${pad(i, 6)}`;

export const QUERY_TYPES: QueryType[] = [
  { name: 'text', make: (k) => body(TEXT_QUERIES[k % TEXT_QUERIES.length] as string, [], ['kind', 'brand']), searches: 400 },
  {
    name: 'text+kind/brand filter',
    make: (k) =>
      body(TEXT_QUERIES[k % TEXT_QUERIES.length] as string, k % 2 ? ['kind = "plug"'] : ['brand = "Benchline"'], ['kind', 'brand']),
    searches: 400,
  },
  { name: 'number', make: (k) => body(numberOf(someCurrentPart(k)), [], []), searches: 600 },
  {
    name: 'interchange number',
    make: (k) => {
      const i = someCurrentPart(k);
      return body(`${FOREIGN_PREFIXES[k % 3]}${(i * 7 + (k % 3) * 13) % 1000}${pad(i, 6)}`, [], []);
    },
    searches: 600,
  },
  { name: 'number prefix', make: (k) => body(numberOf(someCurrentPart(k)).slice(0, 7), [], []), searches: 400 },
  { name: 'number one typo', make: (k) => body(withOneTypo(numberOf(someCurrentPart(k)), 3 + (k % 6)), [], []), searches: 400 },
  { name: 'spec: all current', make: () => body('', [], FACET_ATTRIBUTES), searches: 200 },
  {
    name: 'spec: kind + thread',
    make: (k) =>
      body('', ['kind = "plug"', `threadMm ${[14, 12, 10][k % 3]! - 0.005} TO ${[14, 12, 10][k % 3]! + 0.005}`], FACET_ATTRIBUTES),
    searches: 200,
  },
  {
    name: 'spec: text + facet',
    make: (k) => body(TEXT_QUERIES[k % TEXT_QUERIES.length] as string, ['heatStep = 6'], FACET_ATTRIBUTES),
    searches: 200,
  },
];

interface RunningChild {
  url: string;
  child: ChildProcess;
  stop(): Promise<void>;
}

/** Starts `main.ts` of the stand-in in a node process of its own and waits for its address. */
async function startStandinProcess(entry: string, nodeArgs: string[]): Promise<RunningChild> {
  const child = spawn(process.execPath, [...nodeArgs, '--import', 'tsx', entry], {
    cwd: ROOT,
    env: { ...process.env, MEILI_STANDIN_PORT: '0', MEILI_STANDIN_HOST: '127.0.0.1', MEILI_API_KEY: '' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const url = await new Promise<string>((resolveUrl, reject) => {
    let seen = '';
    const onData = (chunk: Buffer): void => {
      seen += chunk.toString();
      const match = /listening on (http:\/\/[^\s]+)/.exec(seen);
      if (match) {
        child.stdout?.off('data', onData);
        resolveUrl(match[1] as string);
      }
    };
    child.stdout?.on('data', onData);
    child.once('exit', (code) => reject(new Error(`stand-in exited with ${code} before listening: ${seen}`)));
  });
  // Anything the stand-in prints later (errors, or --trace-gc through STANDIN_NODE_ARGS) is passed on.
  child.stdout?.pipe(process.stdout);
  return {
    url,
    child,
    stop: () =>
      new Promise<void>((done) => {
        if (child.exitCode !== null) return done();
        child.once('exit', () => done());
        child.kill('SIGTERM');
      }),
  };
}

interface Sample {
  ms: number;
  serverMs: number;
  hits: number;
  total: number;
}

/** Connections the server reset before answering (its keep-alive timer firing while it was busy). */
let resets = 0;

function isReset(error: unknown): boolean {
  const cause = error instanceof Error ? (error.cause as { code?: string } | undefined) : undefined;
  return cause?.code === 'ECONNRESET' || cause?.code === 'UND_ERR_SOCKET';
}

/** One search; a reset connection is retried (a search is idempotent) and counted, its time included. */
async function searchOnce(url: string, search: SearchBody): Promise<Sample> {
  const start = performance.now();
  let response: Response | undefined;
  for (let attempt = 0; !response; attempt++) {
    try {
      response = await fetch(`${url}/indexes/${UID}/search`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify(search),
      });
    } catch (error) {
      if (!isReset(error) || attempt >= 3) throw error;
      resets++;
    }
  }
  const result = (await response.json()) as { hits?: unknown[]; processingTimeMs?: number; estimatedTotalHits?: number; message?: string };
  const ms = performance.now() - start;
  if (!response.ok) throw new Error(`search ${JSON.stringify(search)} failed: ${result.message ?? response.status}`);
  return { ms, serverMs: result.processingTimeMs ?? Number.NaN, hits: result.hits?.length ?? 0, total: result.estimatedTotalHits ?? 0 };
}

/** `count` searches of one type spread over `clients` concurrent loops; latencies sorted. */
async function drive(url: string, type: QueryType, clients: number, count: number): Promise<{ samples: Sample[]; seconds: number }> {
  const samples: Sample[] = [];
  let next = 0;
  const started = performance.now();
  await Promise.all(
    Array.from({ length: clients }, async () => {
      while (next < count) {
        const k = next++;
        samples.push(await searchOnce(url, type.make(k)));
      }
    }),
  );
  return { samples, seconds: (performance.now() - started) / 1000 };
}

function describe(samples: Sample[], seconds: number): string {
  const ms = samples.map((s) => s.ms).sort((a, b) => a - b);
  const server = samples.map((s) => s.serverMs).sort((a, b) => a - b);
  return (
    `p50 ${percentile(ms, 50).toFixed(2).padStart(7)} ms  p95 ${percentile(ms, 95).toFixed(2).padStart(7)} ms  ` +
    `(server p50 ${String(percentile(server, 50)).padStart(3)}, p95 ${String(percentile(server, 95)).padStart(3)} ms; ` +
    `${(samples.length / seconds).toFixed(0).padStart(5)}/s)`
  );
}

interface EngineModules {
  StandinIndex: new (
    uid: string,
    primaryKey: string | null,
  ) => {
    updateSettings(patch: Record<string, unknown>): void;
    writeDocuments(documents: Record<string, unknown>[], mode: 'replace', primaryKey: string | null): number;
  };
  runSearch: (index: unknown, request: unknown) => unknown;
  readSearchRequest: (body: unknown) => unknown;
}

/**
 * The engine alone, in this process: the same documents and searches straight through runSearch
 * (and JSON.stringify of the answer), timed as CPU per search — what a search costs the event loop
 * that runs it, without HTTP or the load generator. Imports the stand-in next to `entry`.
 */
async function runEngineTimings(
  entry: string,
  documents: readonly PartDocument[],
  only: string[] | undefined,
  scale: number,
): Promise<void> {
  const dir = dirname(entry);
  const modules = {
    ...((await import(resolve(dir, 'standin-index.ts'))) as Pick<EngineModules, 'StandinIndex'>),
    ...((await import(resolve(dir, 'search-engine.ts'))) as Pick<EngineModules, 'runSearch'>),
    ...((await import(resolve(dir, 'search-request.ts'))) as Pick<EngineModules, 'readSearchRequest'>),
  };
  const index = new modules.StandinIndex(UID, 'id');
  index.updateSettings({
    searchableAttributes: SEARCHABLE_ATTRIBUTES,
    filterableAttributes: FILTERABLE_ATTRIBUTES,
    sortableAttributes: ['partNumber', 'onHand'],
  });
  for (let from = 0; from < documents.length; from += BATCH) {
    // A copy, as the HTTP route hands over freshly parsed documents.
    index.writeDocuments(JSON.parse(JSON.stringify(documents.slice(from, from + BATCH))) as Record<string, unknown>[], 'replace', 'id');
  }
  console.log('  engine alone (runSearch + JSON.stringify in one process, CPU time per search):');
  for (const type of QUERY_TYPES) {
    if (only && !only.includes(type.name)) continue;
    const count = Math.max(CONCURRENCY, Math.round(type.searches * scale));
    for (let k = 0; k < Math.min(40, count); k++) JSON.stringify(modules.runSearch(index, modules.readSearchRequest(type.make(k))));
    const cpu: number[] = [];
    const started = performance.now();
    for (let k = 0; k < count && performance.now() - started < 10_000; k++) {
      const body = type.make(k);
      const before = process.cpuUsage();
      JSON.stringify(modules.runSearch(index, modules.readSearchRequest(body)));
      const used = process.cpuUsage(before);
      cpu.push((used.user + used.system) / 1000);
    }
    cpu.sort((a, b) => a - b);
    console.log(
      `    ${type.name.padEnd(24)} p50 ${percentile(cpu, 50).toFixed(2).padStart(7)} ms  p95 ${percentile(cpu, 95).toFixed(2).padStart(7)} ms  (${cpu.length} searches)`,
    );
  }
}

/**
 * Starts a stand-in process, indexes the documents, runs every query type over HTTP and prints
 * the figures; then times the engine alone in this process (BENCH_ENGINE=0 skips that part).
 */
export async function runStandinBench(): Promise<void> {
  const entry = resolve(ROOT, process.env.STANDIN_ENTRY ?? 'server/search-standin/main.ts');
  const nodeArgs = (process.env.STANDIN_NODE_ARGS ?? '').split(/\s+/).filter(Boolean);
  const only = process.env.BENCH_ONLY?.split(',').map((name) => name.trim());
  const scale = Number(process.env.BENCH_SCALE ?? 1) || 1;
  const documents = partDocuments(DOCUMENTS, seededRandom(20_240_917));
  const standin = await startStandinProcess(entry, nodeArgs);
  try {
    const client = new Meilisearch({ host: standin.url, defaultWaitOptions: { timeout: 300_000, interval: 20 } });
    const index = client.index<PartDocument>(UID);
    await client.createIndex(UID, { primaryKey: 'id' }).waitTask();
    await index
      .updateSettings({
        searchableAttributes: SEARCHABLE_ATTRIBUTES,
        filterableAttributes: FILTERABLE_ATTRIBUTES,
        sortableAttributes: ['partNumber', 'onHand'],
      })
      .waitTask();

    const indexStart = performance.now();
    const enqueued = [];
    for (let from = 0; from < documents.length; from += BATCH) enqueued.push(await index.addDocuments(documents.slice(from, from + BATCH)));
    const finished = await client.tasks.waitForTasks(enqueued, { timeout: 600_000, interval: 20 });
    const indexSeconds = (performance.now() - indexStart) / 1000;
    const failed = finished.filter((task) => task.status !== 'succeeded');
    if (failed.length > 0) throw new Error(`indexing failed: ${JSON.stringify(failed[0]?.error)}`);
    console.log(
      `standin-search: ${DOCUMENTS.toLocaleString('en')} part documents indexed in ${indexSeconds.toFixed(1)} s ` +
        `(${DOCUMENTS / BATCH} batches of ${BATCH.toLocaleString('en')}), stand-in ${process.env.STANDIN_ENTRY ?? 'server/search-standin/main.ts'}`,
    );

    for (const type of QUERY_TYPES) {
      if (only && !only.includes(type.name)) continue;
      const count = Math.max(CONCURRENCY, Math.round(type.searches * scale));
      // Warm-up: the first searches fill per-field caches and let V8 optimise.
      await drive(standin.url, type, 2, Math.min(40, count));
      resets = 0;
      const one = await drive(standin.url, type, 1, Math.ceil(count / 2));
      const many = await drive(standin.url, type, CONCURRENCY, count);
      const resetNote = resets > 0 ? `; ${resets} connection resets retried` : '';
      const hits = one.samples.reduce((sum, s) => sum + s.hits, 0) / one.samples.length;
      const total = one.samples.reduce((sum, s) => sum + s.total, 0) / one.samples.length;
      console.log(`  ${type.name} (${hits.toFixed(1)} hits, ~${total.toFixed(0)} estimatedTotalHits)`);
      console.log(`     1 client : ${describe(one.samples, one.seconds)}`);
      console.log(`    ${String(CONCURRENCY).padStart(2)} clients: ${describe(many.samples, many.seconds)}${resetNote}`);
    }
  } finally {
    await standin.stop();
  }
  if (process.env.BENCH_ENGINE !== '0') await runEngineTimings(entry, documents, only, scale);
}

const invokedDirectly = process.argv[1] !== undefined && realpathSync(process.argv[1]) === realpathSync(fileURLToPath(import.meta.url));
if (invokedDirectly) {
  await runStandinBench();
}
