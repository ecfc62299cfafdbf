/**
 * Benchmark: the search stand-in holding 100,000 synthetic part documents, driven over HTTP by
 * the real `meilisearch` SDK. Prints the time to index them (10 batches of 10,000, until the last
 * task has succeeded) and p50/p95 of 1,000 mixed searches (exact numbers, prefixes, one-typo
 * numbers, words, with filters and facets). Run with `npx tsx tests/bench/standin-search.ts`.
 */
import { realpathSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Meilisearch, type SearchParams } from 'meilisearch';
import { startSearchStandin } from '../../server/search-standin/server';

const DOCUMENTS = 100_000;
const BATCH = 10_000;
const SEARCHES = 1_000;
const WARMUP_SEARCHES = 50;

/** mulberry32: a small seeded generator, so every run indexes the same documents. */
function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

const BRANDS = ['Orvane', 'Telrix', 'Quillon', 'Brastow', 'Kemlar', 'Vonteq', 'Halvex', 'Sormin', 'Dravik', 'Pellum'];
const CATEGORIES = ['spark-plug', 'coil', 'lead', 'distributor', 'sensor', 'module'];
const MATERIALS = ['iridium', 'platinum', 'copper', 'nickel', 'silver', 'ruthenium'];
const KINDS = ['spark plug', 'ignition coil', 'ignition lead', 'distributor cap', 'crank sensor', 'ignition module'];
const WORDS = [
  'long',
  'reach',
  'resistor',
  'tapered',
  'seat',
  'pencil',
  'tower',
  'silicone',
  'heavy',
  'duty',
  'racing',
  'fine',
  'wire',
  'twin',
  'tip',
];
const PREFIXES = ['QX', 'TRL', 'QLN', 'ORV', 'BRS', 'KML', 'VNT', 'HVX', 'SRM', 'DRV'];

interface BenchPart {
  id: string;
  sku: string;
  name: string;
  brand: string;
  category: string;
  material: string;
  description: string;
  numbers: string[];
  vehicles: string[];
  thread: string;
  heatRange: number;
  priceCents: number;
}

function syntheticParts(count: number, random: () => number): BenchPart[] {
  const pick = <T>(list: readonly T[]): T => list[Math.floor(random() * list.length)] as T;
  const partNumber = (): string => `${pick(PREFIXES)}${Math.floor(1_000 + random() * 98_999_000)}`;
  return Array.from({ length: count }, (_, k) => {
    const kind = pick(KINDS);
    const material = pick(MATERIALS);
    return {
      id: `P${k}`,
      sku: `SKU${String(k).padStart(7, '0')}`,
      name: `${material} ${kind}`,
      brand: pick(BRANDS),
      category: pick(CATEGORIES),
      material,
      description: Array.from({ length: 6 }, () => pick(WORDS)).join(' '),
      numbers: Array.from({ length: 3 + Math.floor(random() * 3) }, partNumber),
      vehicles: Array.from({ length: 2 + Math.floor(random() * 3) }, () => `V${Math.floor(random() * 500)}`),
      thread: `M${pick([10, 12, 14, 18])}`,
      heatRange: 4 + Math.floor(random() * 6),
      priceCents: 300 + Math.floor(random() * 12_000),
    };
  });
}

/** A one-character substitution after the first letter, so Meilisearch's typo rule allows it. */
function withOneTypo(word: string, random: () => number): string {
  const at = 1 + Math.floor(random() * (word.length - 1));
  const replacement = word[at] === '7' ? '3' : '7';
  return word.slice(0, at) + replacement + word.slice(at + 1);
}

function percentile(sorted: readonly number[], p: number): number {
  const index = Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1);
  return sorted[Math.max(0, index)] ?? Number.NaN;
}

type BenchQuery = { q: string; params: SearchParams };

function mixedQueries(parts: readonly BenchPart[], count: number, random: () => number): BenchQuery[] {
  const pickPart = (): BenchPart => parts[Math.floor(random() * parts.length)] as BenchPart;
  const firstNumber = (part: BenchPart): string => part.numbers[0] ?? part.sku;
  const shapes: Array<() => BenchQuery> = [
    () => ({ q: firstNumber(pickPart()), params: {} }),
    () => ({ q: firstNumber(pickPart()).slice(0, 6), params: {} }),
    () => ({ q: withOneTypo(firstNumber(pickPart()), random), params: {} }),
    () => ({ q: `${pickPart().material} plug`, params: { filter: `brand = ${pickPart().brand}`, limit: 20 } }),
    () => ({
      q: firstNumber(pickPart()),
      params: { filter: ['heatRange 5 TO 8', ['category = coil', 'category = "spark-plug"']], facets: ['brand'] },
    }),
    () => ({ q: 'iridium', params: { sort: ['priceCents:asc'], filter: `vehicles = V${Math.floor(random() * 500)}` } }),
  ];
  return Array.from({ length: count }, () => (shapes[Math.floor(random() * shapes.length)] as () => BenchQuery)());
}

/** Starts a stand-in, indexes the documents, runs the searches and prints the figures. */
export async function runStandinBench(): Promise<void> {
  const random = seededRandom(20_240_917);
  const parts = syntheticParts(DOCUMENTS, random);
  const standin = await startSearchStandin({ port: 0 });
  try {
    const client = new Meilisearch({ host: standin.url, defaultWaitOptions: { timeout: 120_000, interval: 20 } });
    const index = client.index<BenchPart>('bench_parts');
    await client.createIndex('bench_parts', { primaryKey: 'id' }).waitTask();
    await index
      .updateSettings({
        searchableAttributes: ['numbers', 'sku', 'name', 'brand', 'material', 'description', 'category', 'thread', 'vehicles'],
        filterableAttributes: ['brand', 'category', 'heatRange', 'vehicles', 'numbers', 'priceCents'],
        sortableAttributes: ['priceCents'],
      })
      .waitTask();

    const indexStart = performance.now();
    const enqueued = [];
    for (let from = 0; from < parts.length; from += BATCH) enqueued.push(await index.addDocuments(parts.slice(from, from + BATCH)));
    const finished = await client.tasks.waitForTasks(enqueued, { timeout: 300_000, interval: 20 });
    const indexSeconds = (performance.now() - indexStart) / 1000;
    const failed = finished.filter((task) => task.status !== 'succeeded');
    if (failed.length > 0) throw new Error(`indexing failed: ${JSON.stringify(failed[0]?.error)}`);

    const queries = mixedQueries(parts, WARMUP_SEARCHES + SEARCHES, random);
    const times: number[] = [];
    const serverTimes: number[] = [];
    let totalHits = 0;
    for (const [k, query] of queries.entries()) {
      const start = performance.now();
      const result = await index.search(query.q, query.params);
      const elapsed = performance.now() - start;
      if (k < WARMUP_SEARCHES) continue;
      times.push(elapsed);
      serverTimes.push(result.processingTimeMs);
      totalHits += result.hits.length;
    }
    times.sort((a, b) => a - b);
    serverTimes.sort((a, b) => a - b);

    console.log(
      `standin-search: ${DOCUMENTS.toLocaleString('en')} documents indexed in ${indexSeconds.toFixed(1)} s ` +
        `(${DOCUMENTS / BATCH} batches of ${BATCH.toLocaleString('en')}); ${SEARCHES} searches over HTTP — ` +
        `p50 ${percentile(times, 50).toFixed(2)} ms, p95 ${percentile(times, 95).toFixed(2)} ms ` +
        `(server processingTimeMs p50 ${percentile(serverTimes, 50)}, p95 ${percentile(serverTimes, 95)}); ` +
        `${(totalHits / SEARCHES).toFixed(1)} hits per search`,
    );
  } finally {
    await standin.close();
  }
}

const invokedDirectly = process.argv[1] !== undefined && realpathSync(process.argv[1]) === realpathSync(fileURLToPath(import.meta.url));
if (invokedDirectly) {
  await runStandinBench();
}
