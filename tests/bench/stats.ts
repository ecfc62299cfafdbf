/** Percentiles of a list of milliseconds, by nearest rank. */
export function percentile(sortedMs: number[], p: number): number {
  if (!sortedMs.length) return NaN;
  const i = Math.min(sortedMs.length - 1, Math.max(0, Math.ceil((p / 100) * sortedMs.length) - 1));
  return sortedMs[i]!;
}

export interface LatencySummary {
  count: number;
  p50: number;
  p95: number;
  p99: number;
  perSecond: number;
}

export function summarise(latenciesMs: number[], seconds: number): LatencySummary {
  const sorted = [...latenciesMs].sort((a, b) => a - b);
  return {
    count: sorted.length,
    p50: percentile(sorted, 50),
    p95: percentile(sorted, 95),
    p99: percentile(sorted, 99),
    perSecond: sorted.length / seconds,
  };
}

export const fmt = (ms: number): string => `${ms.toFixed(2)} ms`;
