import { CompatInputError, requireFinite } from './errors';
import { verdictRank, type Verdict } from './types';

/** What the ranking needs of a comparison: its overall verdict and how far it strays. */
export interface RankableResult {
  verdict: Verdict;
  deviation: number;
}

export interface RankCandidate<R extends RankableResult = RankableResult> {
  id: string;
  result: R;
  inStock: boolean;
  /** Sell price in cents; null where the part has no price (ranked after priced parts). */
  priceCents: number | null;
}

export interface RankOptions {
  /** No-go alternates are shown only on request (compat-model.md §7). Default false. */
  includeNoGo?: boolean;
  /**
   * Deviations are compared in steps of this size, so parts that differ by rounding noise tie
   * and stock and price decide. Default 0.001 (a tenth of a percent).
   */
  deviationStep?: number;
}

function guardCandidate(c: RankCandidate, index: number): void {
  requireFinite(c.result.deviation, `candidates[${index}].result.deviation`);
  if (c.priceCents !== null) requireFinite(c.priceCents, `candidates[${index}].priceCents`);
  if (c.result.deviation < 0) {
    throw new CompatInputError(`candidates[${index}].result.deviation`, 'must not be negative');
  }
}

/**
 * Ranks alternates: overall verdict (go, review, no-go), then the smallest deviation in energy
 * and reserve, then in stock, then price; the id breaks remaining ties so the order is stable.
 */
export function rankAlternates<C extends RankCandidate>(candidates: readonly C[], options: RankOptions = {}): C[] {
  const includeNoGo = options.includeNoGo ?? false;
  const step = options.deviationStep ?? 0.001;
  const bucket = (deviation: number): number => (step > 0 ? Math.round(deviation / step) : deviation);
  candidates.forEach(guardCandidate);
  const keyed = candidates
    .filter((c) => includeNoGo || c.result.verdict !== 'no-go')
    .map((c) => ({
      candidate: c,
      verdict: verdictRank(c.result.verdict),
      deviation: bucket(c.result.deviation),
      price: c.priceCents ?? Number.POSITIVE_INFINITY,
    }));
  keyed.sort(
    (a, b) =>
      a.verdict - b.verdict ||
      a.deviation - b.deviation ||
      Number(b.candidate.inStock) - Number(a.candidate.inStock) ||
      (a.price === b.price ? 0 : a.price < b.price ? -1 : 1) ||
      (a.candidate.id < b.candidate.id ? -1 : a.candidate.id > b.candidate.id ? 1 : 0),
  );
  return keyed.map((k) => k.candidate);
}
