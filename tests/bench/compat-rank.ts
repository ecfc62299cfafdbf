/**
 * Benchmark: rank 2,000 random coil alternates for one engine with full verdicts, in-process.
 * Goal: median ≤ 5 ms. Run with `npx tsx tests/bench/compat-rank.ts`, or import and call.
 */
import { realpathSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { prepareCoilComparison, type CoilComparison, type CoilJudgement } from '../../shared/compat/coil-checks';
import { rankAlternates, type RankCandidate } from '../../shared/compat/rank';
import { DEFAULT_COMPAT_SETTINGS } from '../../shared/compat/settings';
import type { CoilSpec, EngineSpec } from '../../shared/schemas/specs';

const CANDIDATES = 2_000;
const RUNS = 50;
const WARMUP_RUNS = 5;
const GOAL_MS = 5;

/** mulberry32: a small seeded generator, so every run ranks the same candidates. */
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

const engine: EngineSpec = {
  code: 'BENCH-E10',
  displacementL: 2,
  cylinders: 4,
  compressionRatio: 10,
  aspiration: 'turbo',
  peakBoostKpa: 80,
  rodRatio: 3.5,
  specGapMm: 0.7,
  dwellMs: 3,
  crankingDwellMs: 4,
  driverCurrentLimitA: null,
};

const original: CoilSpec = {
  architecture: 'coil-on-plug',
  driver: 'integrated',
  outputs: 1,
  connectorPins: 3,
  connectorKey: 'A',
  primaryOhmMin: 0.5,
  primaryOhmMax: 0.7,
  primaryInductanceMh: 2.5,
  secondaryKohmMin: 5,
  secondaryKohmMax: 7,
  turnsRatio: 100,
  availableKv: 40,
  peakCurrentA: 8,
};

function randomCandidates(
  count: number,
  random: () => number,
): Array<{ id: string; spec: CoilSpec; inStock: boolean; priceCents: number }> {
  const between = (lo: number, hi: number): number => lo + (hi - lo) * random();
  return Array.from({ length: count }, (_, k) => {
    const primaryOhmMin = between(0.3, 1.0);
    const secondaryKohmMin = between(3, 9);
    const spec: CoilSpec = {
      ...original,
      driver: random() < 0.95 ? 'integrated' : 'external',
      connectorKey: random() < 0.9 ? 'A' : 'B',
      primaryOhmMin,
      primaryOhmMax: primaryOhmMin + between(0.05, 0.3),
      primaryInductanceMh: between(1.5, 4),
      secondaryKohmMin: random() < 0.2 ? null : secondaryKohmMin,
      secondaryKohmMax: null,
      turnsRatio: between(70, 130),
      availableKv: random() < 0.3 ? null : between(25, 45),
      peakCurrentA: between(6, 10),
    };
    spec.secondaryKohmMax = spec.secondaryKohmMin == null ? null : secondaryKohmMin + between(0.5, 2);
    return {
      id: `ALT-${String(k).padStart(4, '0')}`,
      spec,
      inStock: random() < 0.6,
      priceCents: Math.round(between(2_000, 9_000)),
    };
  });
}

function percentile(sorted: readonly number[], p: number): number {
  const index = Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1);
  return sorted[Math.max(0, index)] ?? Number.NaN;
}

/** Wall-clock and CPU milliseconds per run; CPU time is steadier on a machine shared with other work. */
function timeRuns(run: () => void): { median: number; p95: number; cpuMedian: number } {
  for (let k = 0; k < WARMUP_RUNS; k++) run();
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let k = 0; k < RUNS; k++) {
    const cpuStart = process.cpuUsage();
    const start = performance.now();
    run();
    wall.push(performance.now() - start);
    const used = process.cpuUsage(cpuStart);
    cpu.push((used.user + used.system) / 1_000);
  }
  wall.sort((a, b) => a - b);
  cpu.sort((a, b) => a - b);
  return {
    median: percentile(wall, 50),
    p95: percentile(wall, 95),
    cpuMedian: percentile(cpu, 50),
  };
}

/** How many ranked alternates a page shows with their reasons. */
const SHOWN = 10;

/**
 * Builds the candidates and times, over RUNS runs, what the API does for a vehicle's alternates:
 * judge all of them (every row's verdict), rank them, and explain the ones shown. For
 * comparison it also times building the full prose comparison for every candidate.
 */
export async function runCompatRankBench(): Promise<void> {
  const candidates = randomCandidates(CANDIDATES, seededRandom(20_240_601));
  let ranked: Array<RankCandidate<CoilJudgement> & { spec: CoilSpec }> = [];
  let shown: CoilComparison[] = [];

  const rankAndExplain = (): void => {
    const comparer = prepareCoilComparison({ original, engine, settings: DEFAULT_COMPAT_SETTINGS });
    // rankAlternates passes extra fields through, so each ranked entry still carries its spec
    ranked = rankAlternates(
      candidates.map((c) => ({
        id: c.id,
        spec: c.spec,
        result: comparer.judge(c.spec),
        inStock: c.inStock,
        priceCents: c.priceCents,
      })),
      { includeNoGo: true },
    );
    shown = ranked.slice(0, SHOWN).map((c) => comparer.compare(c.spec));
  };
  const fullProse = (): void => {
    const comparer = prepareCoilComparison({ original, engine, settings: DEFAULT_COMPAT_SETTINGS });
    rankAlternates(
      candidates.map((c) => ({
        id: c.id,
        result: comparer.compare(c.spec, { curves: false }),
        inStock: c.inStock,
        priceCents: c.priceCents,
      })),
      { includeNoGo: true },
    );
  };

  const main = timeRuns(rankAndExplain);
  const prose = timeRuns(fullProse);
  const counts = { go: 0, review: 0, 'no-go': 0 };
  for (const c of ranked) counts[c.result.verdict] += 1;

  console.log(
    `compat-rank: ${CANDIDATES} coil alternates judged and ranked, top ${shown.length} explained, ${RUNS} runs — ` +
      `median ${main.median.toFixed(2)} ms, p95 ${main.p95.toFixed(2)} ms, CPU median ${main.cpuMedian.toFixed(2)} ms ` +
      `(goal ≤ ${GOAL_MS} ms: ${main.median <= GOAL_MS ? 'met' : 'missed'})`,
  );
  console.log(
    `compat-rank: with every reason written for all ${CANDIDATES} — median ${prose.median.toFixed(2)} ms, ` +
      `p95 ${prose.p95.toFixed(2)} ms, CPU median ${prose.cpuMedian.toFixed(2)} ms`,
  );
  console.log(`compat-rank: verdicts go ${counts.go}, review ${counts.review}, no-go ${counts['no-go']}`);
}

const invokedDirectly = process.argv[1] !== undefined && realpathSync(process.argv[1]) === realpathSync(fileURLToPath(import.meta.url));
if (invokedDirectly) {
  await runCompatRankBench();
}
