/**
 * The stand-in's fast text ranking (ranking rules packed into one integer, a bounded heap over
 * typed arrays) must order candidates exactly as the comparator built from the same rules does.
 * Random candidates with many ties, every order of the built-in rules. No database needed.
 */
import { describe, expect, it } from 'vitest';
import type { DocumentRecord } from '../../../server/search-standin/document-record';
import {
  buildComparator,
  packedRanking,
  packRank,
  selectBest,
  selectTopPacked,
  type RankedCandidate,
} from '../../../server/search-standin/ranking';

function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

function permutations<T>(items: readonly T[]): T[][] {
  if (items.length <= 1) return [[...items]];
  return items.flatMap((item, i) => permutations([...items.slice(0, i), ...items.slice(i + 1)]).map((rest) => [item, ...rest]));
}

describe('stand-in packed ranking', () => {
  it('picks and orders the best candidates as the comparator does', { timeout: 60_000 }, () => {
    const random = seeded(11);
    const rules = ['words', 'typo', 'proximity', 'attribute', 'sort', 'exactness'];
    for (const order of permutations(rules)) {
      const plan = packedRanking(order, []);
      if (!plan) throw new Error('no packed plan for built-in rules');
      const compare = buildComparator(order, [], true);
      const n = 300;
      const candidates: RankedCandidate[] = Array.from({ length: n }, (_, seq) => ({
        record: { seq, id: String(seq), doc: {}, facts: null } as DocumentRecord,
        level: 1 + Math.floor(random() * 10),
        typos: Math.floor(random() * 21),
        attributeRank: Math.floor(random() * 24),
        exactWords: Math.floor(random() * 11),
        score: Math.floor(random() * 4) / 3,
      }));
      // Unsorted by seq, as text candidates come.
      candidates.sort(() => random() - 0.5);
      const keys = Int32Array.from(candidates.map((c) => packRank(plan, c.level, c.typos, c.attributeRank, c.exactWords)));
      const scores = Float64Array.from(candidates.map((c) => c.score));
      const seqs = Int32Array.from(candidates.map((c) => c.record.seq));
      for (const count of [0, 1, 20, 299, 300, 1000]) {
        const expected = selectBest(candidates, count, compare).map((c) => c.record.seq);
        const got = selectTopPacked(n, count, keys, scores, seqs).map((i) => seqs[i]);
        expect(got, `${order.join(',')} top ${count}`).toEqual(expected);
      }
    }
  });

  it('leaves sort criteria and custom rules to the comparator', () => {
    expect(packedRanking(['words', 'sort'], [{ attribute: 'price', descending: false }])).toBeNull();
    expect(packedRanking(['words', 'price:asc'], [])).toBeNull();
  });
});
