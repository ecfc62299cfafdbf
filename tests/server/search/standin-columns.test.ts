/**
 * The stand-in's field columns (field-store.ts) against references: facet counts against the
 * per-document counting the stand-in did before (kept here as the reference), both ways of
 * counting (walking documents, AND-and-popcount per value), and bitset filters against the
 * predicate filters the document routes still use — on random documents with mixed spellings,
 * arrays, numbers, numeric strings, booleans, nulls and nested objects, before and after
 * updates and deletions. No database needed.
 */
import { describe, expect, it } from 'vitest';
import { countBits, createBitset, hasBit, listBits, setBit } from '../../../server/search-standin/bitset';
import { factsOf, type DocumentRecord } from '../../../server/search-standin/document-record';
import { computeFacets, type FacetDocuments, type FacetResult } from '../../../server/search-standin/facets';
import type { FieldFacts, JsonObject } from '../../../server/search-standin/field-paths';
import { compileBitsetFilter } from '../../../server/search-standin/filter-bitsets';
import { compileFilter } from '../../../server/search-standin/filter-evaluator';
import type { ResolvedSettings } from '../../../server/search-standin/index-settings';
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

const FACETS = ['brand', 'kind', 'heat', 'tags', 'flag', 'nested.a', 'mixed', 'absent'];

function randomDocument(random: () => number, id: number): JsonObject {
  const pick = <T>(list: readonly T[]): T => list[Math.floor(random() * list.length)] as T;
  const doc: JsonObject = { id: `d${id}`, kind: pick(['coil', 'plug']) };
  if (random() < 0.95) doc.brand = pick(['Orvane', 'orvane', 'ORVANE ', ' Telrix', 'telrix', 'Quillon', 'Kemlar', '']);
  const heat = random();
  if (heat < 0.5) doc.heat = 4 + Math.floor(random() * 6);
  else if (heat < 0.6) doc.heat = String(4 + Math.floor(random() * 6));
  else if (heat < 0.8) doc.heat = null;
  if (random() < 0.8)
    doc.tags = Array.from({ length: Math.floor(random() * 4) }, () => pick(['Alder', 'alder', 'birch', 'Cedar', 'cedar ', 'elm']));
  const flag = random();
  doc.flag = flag < 0.4 ? true : flag < 0.7 ? false : flag < 0.8 ? 'true' : null;
  if (random() < 0.5) doc.nested = random() < 0.8 ? { a: Math.floor(random() * 5) / 2 } : {};
  doc.mixed = pick<unknown>([6, '6', '6.0', ' 7 ', 7, 'seven', [6, '6'], [1, 2, 2], -0, 0]);
  return doc;
}

/** The stand-in's facet counting before columns: each document's facts, in the order given. */
function referenceFacets(records: readonly DocumentRecord[], names: readonly string[], settings: ResolvedSettings): FacetResult {
  interface ValueCount {
    label: string;
    count: number;
    number: number | null;
  }
  const alphaOrder = (a: ValueCount, b: ValueCount): number => {
    if (a.number !== null && b.number !== null) return a.number - b.number;
    if (a.number !== null) return -1;
    if (b.number !== null) return 1;
    const left = a.label.toLowerCase();
    const right = b.label.toLowerCase();
    return left < right ? -1 : left > right ? 1 : 0;
  };
  const facetDistribution: Record<string, Record<string, number>> = {};
  const facetStats: Record<string, { min: number; max: number }> = {};
  for (const name of names) {
    const strings = new Map<string, ValueCount>();
    const numbers = new Map<number, number>();
    let min = Number.POSITIVE_INFINITY;
    let max = Number.NEGATIVE_INFINITY;
    for (const record of records) {
      const facts: FieldFacts = factsOf(record, name);
      for (const number of facts.numbers) {
        if (number < min) min = number;
        if (number > max) max = number;
      }
      const seen = new Set<string | number>();
      facts.strings.forEach((folded, i) => {
        if (seen.has(folded)) return;
        seen.add(folded);
        const entry = strings.get(folded);
        if (entry) entry.count++;
        else strings.set(folded, { label: facts.displayStrings[i] ?? folded, count: 1, number: null });
      });
      for (const number of facts.jsonNumbers) {
        if (seen.has(number)) continue;
        seen.add(number);
        numbers.set(number, (numbers.get(number) ?? 0) + 1);
      }
    }
    const values = [...strings.values()];
    for (const [number, count] of numbers) values.push({ label: String(number), count, number });
    const order = settings.sortFacetValuesBy[name] ?? settings.sortFacetValuesBy['*'] ?? 'alpha';
    values.sort(order === 'count' ? (a, b) => b.count - a.count || alphaOrder(a, b) : alphaOrder);
    const distribution: Record<string, number> = {};
    for (const value of values.slice(0, settings.maxValuesPerFacet))
      distribution[value.label] = (distribution[value.label] ?? 0) + value.count;
    facetDistribution[name] = distribution;
    if (min <= max) facetStats[name] = { min, max };
  }
  return { facetDistribution, facetStats };
}

function documentsOf(index: StandinIndex, records: readonly DocumentRecord[], ascending: boolean, withBits: boolean): FacetDocuments {
  const seqs = Int32Array.from(records.map((record) => record.seq));
  let bits = null;
  if (withBits) {
    bits = createBitset(index.fieldStore.size);
    for (const record of records) setBit(bits, record.seq);
  }
  return { count: records.length, list: () => seqs, bits, ascending };
}

const FILTERS = [
  'brand = orvane',
  'brand = "ORVANE"',
  'brand != Telrix',
  "brand IN [quillon, ' telrix']",
  'brand NOT IN [orvane]',
  'brand IS EMPTY',
  'brand EXISTS',
  'brand NOT EXISTS',
  'heat = 6',
  'heat >= 7',
  'heat < 6 OR heat IS NULL',
  'heat 5 TO 7',
  'heat IS NOT NULL',
  'tags = alder',
  'tags IS EMPTY',
  'NOT tags = cedar',
  'flag = true',
  'flag != false',
  'nested.a > 1',
  'nested IS EMPTY',
  'mixed = 6',
  'mixed = "6.0"',
  'mixed > 6.5',
  'mixed = seven',
  'mixed CONTAINS "ev"',
  'brand STARTS WITH orv',
  'brand > p',
  'kind = coil AND (brand = orvane OR tags = birch) AND NOT heat = 6',
  'absent = 1',
  'absent NOT EXISTS',
];

/** As the API answers it: JSON (where -0 and 0 are both 0). */
const asJson = (result: FacetResult): unknown => JSON.parse(JSON.stringify(result));

function check(index: StandinIndex, random: () => number): void {
  const records = [...index.records.values()];
  const settings = index.resolved;
  const expected = asJson(referenceFacets(records, FACETS, settings));
  // In document order, by walking and by bitsets.
  expect(asJson(computeFacets(index.fieldStore, documentsOf(index, records, true, false), FACETS, settings))).toEqual(expected);
  expect(asJson(computeFacets(index.fieldStore, documentsOf(index, records, true, true), FACETS, settings))).toEqual(expected);
  // A subset in another order: the first document met decides a multi-spelled label.
  const subset = records.filter(() => random() < 0.6).sort(() => random() - 0.5);
  const expectedSubset = asJson(referenceFacets(subset, FACETS, settings));
  expect(asJson(computeFacets(index.fieldStore, documentsOf(index, subset, false, true), FACETS, settings))).toEqual(expectedSubset);
  expect(asJson(computeFacets(index.fieldStore, documentsOf(index, subset, false, false), FACETS, settings))).toEqual(expectedSubset);

  for (const filter of FILTERS) {
    const predicate = compileFilter(filter, settings.filterableRules);
    const bitset = compileBitsetFilter(filter, settings.filterableRules);
    if (!predicate || !bitset) throw new Error(`no filter from ${filter}`);
    const bits = bitset(index.fieldStore);
    const wanted = records.filter((record) => predicate(record)).map((record) => record.seq);
    const got = new Int32Array(countBits(bits));
    listBits(bits, got);
    expect([...got], filter).toEqual(wanted);
    for (const seq of wanted) expect(hasBit(bits, seq)).toBe(true);
  }
}

describe('stand-in field columns', () => {
  it('count facets and filter as the per-document code did, through writes and deletions', { timeout: 60_000 }, () => {
    const random = seeded(7);
    const index = new StandinIndex('columns', 'id');
    index.updateSettings({ filterableAttributes: ['brand', 'kind', 'heat', 'tags', 'flag', 'nested', 'mixed', 'absent'] });
    index.writeDocuments(
      Array.from({ length: 3000 }, (_, i) => randomDocument(random, i)),
      'replace',
      null,
    );
    check(index, random);

    // Columns now exist and must follow every change. The first documents go first, so a value's
    // first spelling ever seen is no longer its first document's.
    index.writeDocuments(
      Array.from({ length: 20 }, (_, i) => ({ id: `d${i}`, kind: 'plug', brand: 'oRVANE', tags: ['ALDER'] })),
      'replace',
      null,
    );
    index.deleteDocuments(Array.from({ length: 20 }, (_, i) => `d${20 + i}`));
    check(index, random);
    index.writeDocuments(
      Array.from({ length: 300 }, () => randomDocument(random, Math.floor(random() * 3000))),
      'replace',
      null,
    );
    index.writeDocuments(
      Array.from({ length: 200 }, () => ({ id: `d${Math.floor(random() * 3000)}`, brand: 'Brastow', heat: '5' })),
      'update',
      null,
    );
    index.deleteDocuments(Array.from({ length: 400 }, () => `d${Math.floor(random() * 3000)}`));
    index.writeDocuments(
      Array.from({ length: 2500 }, (_, i) => randomDocument(random, 5000 + i)),
      'replace',
      null,
    );
    check(index, random);

    index.updateSettings({ faceting: { sortFacetValuesBy: { '*': 'count' }, maxValuesPerFacet: 3 } });
    check(index, random);

    index.deleteAll();
    index.writeDocuments(
      Array.from({ length: 50 }, (_, i) => randomDocument(random, i)),
      'replace',
      null,
    );
    check(index, random);
  });
});
