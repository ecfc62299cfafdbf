/**
 * The stand-in's text index keeps its packed postings and fuzzy-lookup trie across small writes
 * (amending them) and rebuilds them after large ones. Searching an index that was queried, then
 * changed a little at a time, must answer as a freshly built index of the same documents does:
 * the same documents in the same order, totals and facet counts, for exact, prefix and typo
 * queries. No database.
 */
import { describe, expect, it } from 'vitest';
import type { JsonObject } from '../../../server/search-standin/field-paths';
import { runSearch } from '../../../server/search-standin/search-engine';
import { readSearchRequest } from '../../../server/search-standin/search-request';
import { StandinIndex } from '../../../server/search-standin/standin-index';

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

const WORDS = ['iridium', 'platinum', 'copper', 'spark', 'plug', 'pencil', 'coil', 'pack', 'tower', 'resistor', 'tapered', 'seat'];

function partDocument(random: () => number, id: number, generation = 0): JsonObject {
  const pick = <T>(list: readonly T[]): T => list[Math.floor(random() * list.length)] as T;
  return {
    id: `p${id}`,
    number: `BLP${String(id * 7 + generation).padStart(6, '0')}`,
    interchange: [`FW${String(id * 13 + generation).padStart(7, '0')}`, `GP${String(id).padStart(5, '0')}`],
    description: Array.from({ length: 2 + Math.floor(random() * 4) }, () => pick(WORDS)).join(' '),
    brand: pick(['Orvane', 'Telrix', 'Quillon']),
    current: random() < 0.95,
  };
}

const QUERIES = [
  { q: 'spark plug', filter: 'current = true', facets: ['brand'] },
  { q: 'coil pack', facets: ['brand', 'current'] },
  { q: 'platinun' },
  { q: 'irid' },
  { q: 'BLP000700' },
  { q: 'BLP00070' },
  { q: 'BLP000710' },
  { q: 'FW0001301' },
  { q: 'FW00013' },
  { q: 'GP00100' },
  { q: 'GP01000' },
  { q: 'BLP020001' },
  { q: 'BLP020010' },
  { q: 'FW0260010' },
  { q: 'resistor tapered seat', matchingStrategy: 'all' },
  { q: 'tower', filter: 'brand = Telrix' },
];

function answers(index: StandinIndex): unknown[] {
  return QUERIES.map((query) => {
    const result = runSearch(index, readSearchRequest({ ...query, limit: 1000 })) as {
      hits: Array<{ id: string }>;
      estimatedTotalHits: number;
      facetDistribution?: unknown;
    };
    return {
      q: query.q,
      // In order: scores count live documents only, so an amended index ranks as a fresh one.
      ids: result.hits.map((hit) => hit.id),
      total: result.estimatedTotalHits,
      facets: result.facetDistribution ?? null,
    };
  });
}

function settle(index: StandinIndex): void {
  index.updateSettings({
    searchableAttributes: ['number', 'interchange', 'description', 'brand'],
    filterableAttributes: ['brand', 'current'],
  });
}

describe('stand-in text index across writes', () => {
  it('finds after small writes what a fresh index of the same documents finds', { timeout: 60_000 }, () => {
    const random = seeded(5);
    const documents = new Map<string, JsonObject>();
    const amended = new StandinIndex('amended', 'id');
    settle(amended);
    const write = (docs: JsonObject[], mode: 'replace' | 'update' = 'replace'): void => {
      amended.writeDocuments(docs, mode, null);
      for (const doc of docs) {
        const id = doc.id as string;
        documents.set(id, mode === 'update' ? { ...documents.get(id), ...doc } : doc);
      }
    };
    write(Array.from({ length: 3000 }, (_, i) => partDocument(random, i)));
    answers(amended); // packs the postings and builds the trie

    for (let round = 1; round <= 6; round++) {
      // New documents with new numbers (new words), rewritten and merged ones, deletions.
      write(Array.from({ length: 40 }, (_, i) => partDocument(random, 3000 + round * 100 + i, round)));
      write(Array.from({ length: 25 }, () => partDocument(random, Math.floor(random() * 3000), round)));
      write(
        Array.from({ length: 10 }, () => ({
          id: `p${Math.floor(random() * 3000)}`,
          description: `${WORDS[round]} tower BLP0200${round}0`,
        })),
        'update',
      );
      const gone = Array.from({ length: 15 }, () => `p${Math.floor(random() * 3000)}`);
      amended.deleteDocuments(gone);
      for (const id of gone) documents.delete(id);

      const fresh = new StandinIndex('fresh', 'id');
      settle(fresh);
      fresh.writeDocuments([...documents.values()], 'replace', null);
      expect(answers(amended), `round ${round}`).toEqual(answers(fresh));
    }

    // A large write drops the packed postings; the next search packs them again.
    write(Array.from({ length: 800 }, (_, i) => partDocument(random, 9000 + i, 9)));
    const fresh = new StandinIndex('fresh', 'id');
    settle(fresh);
    fresh.writeDocuments([...documents.values()], 'replace', null);
    expect(answers(amended)).toEqual(answers(fresh));
  });
});
