import { describe, expect, it } from 'vitest';
import { compareCoils } from '../../../shared/compat/coil-checks';
import { CompatInputError } from '../../../shared/compat/errors';
import { rankAlternates, type RankCandidate } from '../../../shared/compat/rank';
import type { Verdict } from '../../../shared/compat/types';
import { makeCoil, makeEngine } from './factories';

const candidate = (id: string, verdict: Verdict, deviation: number, inStock = true, priceCents: number | null = 1_000): RankCandidate => ({
  id,
  result: { verdict, deviation },
  inStock,
  priceCents,
});

const ids = (ranked: readonly RankCandidate[]): string[] => ranked.map((c) => c.id);

describe('ranking alternates', () => {
  it('orders by verdict, then deviation, then stock, then price', () => {
    const ranked = rankAlternates(
      [
        candidate('review-close', 'review', 0.01),
        candidate('go-far', 'go', 0.3),
        candidate('go-close-out-of-stock', 'go', 0.05, false, 500),
        candidate('go-close-dear', 'go', 0.05, true, 2_000),
        candidate('go-close-cheap', 'go', 0.05, true, 900),
        candidate('go-close-unpriced', 'go', 0.05, true, null),
      ],
      { includeNoGo: true },
    );
    expect(ids(ranked)).toEqual([
      'go-close-cheap',
      'go-close-dear',
      'go-close-unpriced',
      'go-close-out-of-stock',
      'go-far',
      'review-close',
    ]);
  });

  it('shows no-go alternates only on request, last', () => {
    const all = [candidate('nogo', 'no-go', 0), candidate('review', 'review', 0.5)];
    expect(ids(rankAlternates(all))).toEqual(['review']);
    expect(ids(rankAlternates(all, { includeNoGo: true }))).toEqual(['review', 'nogo']);
  });

  it('treats deviations within a step as equal so stock decides, and is stable by id', () => {
    const close = [candidate('b', 'go', 0.1002, false), candidate('a', 'go', 0.1004, true)];
    expect(ids(rankAlternates(close))).toEqual(['a', 'b']);
    expect(ids(rankAlternates(close, { deviationStep: 0 }))).toEqual(['b', 'a']);
    const tied = [candidate('y', 'go', 0.2), candidate('x', 'go', 0.2)];
    expect(ids(rankAlternates(tied))).toEqual(['x', 'y']);
    expect(ids(rankAlternates([...tied].reverse()))).toEqual(['x', 'y']);
  });

  it('ranks real coil comparisons: the closest coil first', () => {
    const engine = makeEngine();
    const original = makeCoil();
    const compare = (id: string, inductanceMh: number, availableKv: number): RankCandidate => ({
      id,
      result: compareCoils({
        original,
        substitute: makeCoil({ primaryInductanceMh: inductanceMh, availableKv }),
        engine,
      }),
      inStock: true,
      priceCents: 2_500,
    });
    const ranked = rankAlternates([compare('weak', 2.0, 40), compare('twin', 2.5, 40), compare('near', 2.4, 38)]);
    expect(ids(ranked)).toEqual(['twin', 'near', 'weak']);
  });

  it('refuses a deviation that is not a finite number', () => {
    expect(() => rankAlternates([candidate('bad', 'go', Number.NaN)])).toThrow(CompatInputError);
  });
});
