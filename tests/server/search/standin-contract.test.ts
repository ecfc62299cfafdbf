/**
 * Contract of the search service the app relies on, through the real `meilisearch` SDK: the calls
 * PartSearchIndex and the search service make, and the answers they read. Against the project's
 * stand-in by default; with MEILI_HOST set (and MEILI_API_KEY when the server has a master key)
 * against a real Meilisearch, so only behaviour both give is asserted. Meilisearch's documented
 * rules are the reference: typo budgets (no typo under 5 characters, one from 5, two from 9; a
 * swap of neighbours is one typo), prefix search on the last word, the filter syntax, facet counts
 * over the whole filtered set, 401/403 on a missing/wrong key. Data: the invented demo scenario.
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Meilisearch, type Index, type Task } from 'meilisearch';
import { startSearchStandin, type RunningSearchStandin } from '../../../server/search-standin/server';

interface Doc {
  id: string;
  number: string;
  brand: string;
  kind: 'coil' | 'plug';
  description: string;
  vehicles: string[];
  current: boolean;
  connectorPins: number | null;
  threadMm: number | null;
  onHand: number;
  rankBoost: number;
}

/** A part document with the defaults of a current part without stock, spec or vehicles. */
const doc = (id: string, number: string, brand: string, kind: Doc['kind'], description: string, more: Partial<Doc> = {}): Doc => ({
  id,
  number,
  brand,
  kind,
  description,
  vehicles: [],
  current: true,
  connectorPins: null,
  threadMm: null,
  onHand: 0,
  rankBoost: 0,
  ...more,
});

const DOCS: Doc[] = [
  doc('a1', 'QWIC3140', 'Quaywell', 'coil', 'Ignition coil coil-on-plug 4-pin', {
    vehicles: ['Varrick Halvard'],
    connectorPins: 4,
    onHand: 12,
    rankBoost: 3,
  }),
  doc('a2', 'QWIC31405', 'Quaywell', 'coil', 'Ignition coil coil-on-plug 4-pin long boot', { connectorPins: 4, rankBoost: 2 }),
  doc('a3', 'QWIC3139', 'Quaywell', 'coil', 'Ignition coil coil-on-plug 3-pin', { current: false, connectorPins: 3 }),
  doc('a4', 'NRIC2208', 'Norrow', 'coil', 'Ignition coil pack canister', {
    vehicles: ['Kaymor Ostrel'],
    connectorPins: 2,
    onHand: 3,
    rankBoost: 3,
  }),
  doc('a5', 'QWSP1435', 'Quaywell', 'plug', 'Spark plug copper flat seat', {
    vehicles: ['Varrick Halvard'],
    threadMm: 14,
    onHand: 40,
    rankBoost: 3,
  }),
  doc('a6', 'QWSP1406', 'Quaywell', 'plug', 'Spark plug platinum taper seat', { vehicles: ['Varrick Pennon'], threadMm: 14, rankBoost: 2 }),
  doc('a7', 'SFSP7731', 'Sparrowfield', 'plug', 'Spark plug iridium fine wire', { threadMm: 12, onHand: 5, rankBoost: 3 }),
  doc('a8', 'SFSP7732', 'Sparrowfield', 'plug', 'Spark plug iridium fine wire', { threadMm: 12 }),
];

const SETTINGS = {
  searchableAttributes: ['number', 'brand', 'description', 'vehicles'],
  filterableAttributes: ['id', 'brand', 'kind', 'current', 'connectorPins', 'threadMm'],
  sortableAttributes: ['number', 'onHand'],
  rankingRules: ['words', 'typo', 'proximity', 'attribute', 'sort', 'rankBoost:desc', 'exactness'],
};

const realHost = process.env.MEILI_HOST;
const tag = randomUUID().slice(0, 8);
const uid = `contract_parts_${tag}`;
const other = `contract_other_${tag}`;

let standin: RunningSearchStandin | null = null;
let host: string;
let apiKey: string | undefined;
let client: Meilisearch;
let parts: Index<Doc>;
let setup: Task[];

const ids = (hits: readonly { id: string }[]) => hits.map((h) => h.id);
const expected = (keep: (d: Doc) => boolean) => DOCS.filter(keep).map((d) => d.id);

beforeAll(async () => {
  if (realHost) {
    host = realHost;
    apiKey = process.env.MEILI_API_KEY || undefined;
  } else {
    apiKey = 'contract-test-key';
    standin = await startSearchStandin({ port: 0, apiKey });
    host = standin.url;
  }
  client = new Meilisearch({ host, apiKey });
  parts = client.index<Doc>(uid);
  setup = [
    await client.createIndex(uid, { primaryKey: 'id' }).waitTask(),
    await parts.updateSettings(SETTINGS).waitTask(),
    await parts.addDocuments(DOCS, { primaryKey: 'id' }).waitTask(),
  ];
});

afterAll(async () => {
  for (const u of [uid, other])
    await client
      ?.deleteIndex(u)
      .waitTask()
      .catch(() => undefined);
  await standin?.close();
});

describe('search service contract (meilisearch SDK)', () => {
  it('answers health', async () => {
    expect(await client.health()).toEqual({ status: 'available' });
  });

  it('creates an index, applies settings and adds documents through tasks that succeed', async () => {
    expect(setup.map((t) => [t.type, t.status])).toEqual([
      ['indexCreation', 'succeeded'],
      ['settingsUpdate', 'succeeded'],
      ['documentAdditionOrUpdate', 'succeeded'],
    ]);
    expect((await client.getIndex(uid)).primaryKey).toBe('id');
    expect((await parts.search('')).estimatedTotalHits).toBe(DOCS.length);
  });

  it('ranks the exact number first, then a longer number the last word prefixes', async () => {
    expect(ids((await parts.search('QWIC3140')).hits).slice(0, 2)).toEqual(['a1', 'a2']);
  });

  it('finds a number with one typo: a wrong character, two neighbours swapped, a missing character', async () => {
    expect(ids((await parts.search('QWSP1436')).hits)).toContain('a5');
    expect(ids((await parts.search('QWSP1453')).hits)).toContain('a5');
    expect(ids((await parts.search('NRIC228')).hits)).toContain('a4');
    expect(ids((await parts.search('platinun')).hits)).toEqual(['a6']);
  });

  it('allows one typo, not two, in a word of five to eight characters', async () => {
    // NRCI2280 is two swaps away from NRIC2208.
    expect((await parts.search('NRCI2280')).hits).toEqual([]);
  });

  it('ranks an exact number above one within a typo of it', async () => {
    // SFSP7731 and SFSP7732 are one substitution apart.
    expect(ids((await parts.search('SFSP7732')).hits)).toEqual(['a8', 'a7']);
  });

  it('allows no typo in a word under five characters', async () => {
    const r = await parts.search('cail');
    expect(r.hits).toEqual([]);
    expect(r.estimatedTotalHits).toBe(0);
  });

  it('applies a custom ranking rule after the words: the document with the higher rankBoost first', async () => {
    // a7 and a8 have the same description; a7 has stock (rankBoost 3), a8 has neither (0).
    expect(ids((await parts.search('iridium fine wire')).hits)).toEqual(['a7', 'a8']);
  });

  it('finds by words in any searchable field, vehicles included', async () => {
    expect(ids((await parts.search('Halvard')).hits).sort()).toEqual(['a1', 'a5']);
  });

  it('filters with the forms the app sends: =, booleans, numbers, <=, >=, TO, arrays ANDed', async () => {
    const eq = await parts.search('', { filter: ['current = true', 'kind = "plug"'] });
    expect(ids(eq.hits).sort()).toEqual(expected((d) => d.current && d.kind === 'plug'));
    const pins = await parts.search('coil', { filter: ['current = true', 'connectorPins = 4'] });
    expect(ids(pins.hits).sort()).toEqual(['a1', 'a2']);
    const range = await parts.search('', { filter: 'threadMm 13.995 TO 14.005' });
    expect(ids(range.hits).sort()).toEqual(['a5', 'a6']);
    const cmp = await parts.search('', { filter: ['connectorPins >= 3', 'connectorPins <= 3'] });
    expect(ids(cmp.hits)).toEqual(['a3']);
    const quoted = await parts.search('', { filter: `brand = "Sparrowfield" AND current = true` });
    expect(ids(quoted.hits).sort()).toEqual(['a7', 'a8']);
  });

  it('refuses a filter on an attribute that is not filterable, and a malformed one', async () => {
    await expect(parts.search('', { filter: 'description = plug' })).rejects.toMatchObject({
      cause: { code: 'invalid_search_filter', type: 'invalid_request' },
      response: { status: 400 },
    });
    await expect(parts.search('', { filter: 'brand = ' })).rejects.toMatchObject({ cause: { code: 'invalid_search_filter' } });
  });

  it('counts facets over the whole filtered set, with numeric stats', async () => {
    const r = await parts.search('', { filter: ['current = true'], facets: ['kind', 'brand', 'threadMm'], limit: 1 });
    expect(r.hits).toHaveLength(1);
    expect(r.estimatedTotalHits).toBe(7);
    expect(r.facetDistribution?.kind).toEqual({ coil: 3, plug: 4 });
    expect(r.facetDistribution?.brand).toEqual({ Norrow: 1, Quaywell: 4, Sparrowfield: 2 });
    expect(r.facetStats?.threadMm).toEqual({ min: 12, max: 14 });
  });

  it('pages with limit and offset through one order', async () => {
    const whole = await parts.search('', { limit: 100 });
    const page = await parts.search('', { limit: 2, offset: 3 });
    expect(ids(page.hits)).toEqual(ids(whole.hits).slice(3, 5));
    expect(page).toMatchObject({ limit: 2, offset: 3, estimatedTotalHits: DOCS.length });
  });

  it('reports the number of documents an index holds', async () => {
    expect((await parts.getStats()).numberOfDocuments).toBe(DOCS.length);
  });

  it('replaces a document added again under the same id and deletes in batches', async () => {
    const scratch = client.index<Doc>(other);
    expect((await scratch.addDocuments(DOCS, { primaryKey: 'id' }).waitTask()).status).toBe('succeeded');
    await scratch.updateSettings(SETTINGS).waitTask();
    await scratch.addDocuments([{ ...DOCS[0]!, description: 'Renamed coil' }], { primaryKey: 'id' }).waitTask();
    expect(ids((await scratch.search('renamed')).hits)).toEqual(['a1']);
    const batch = await scratch.deleteDocuments(['a2', 'a3', 'missing']).waitTask();
    expect(batch.status).toBe('succeeded');
    expect(batch.details?.deletedDocuments).toBe(2);
    expect((await scratch.search('')).estimatedTotalHits).toBe(DOCS.length - 2);
    await scratch.deleteDocuments(DOCS.map((d) => d.id)).waitTask();
    expect((await scratch.search('')).estimatedTotalHits).toBe(0);
  });

  it('swaps two indexes: each name then answers with the other one’s documents and settings', async () => {
    const scratch = client.index<Doc>(other);
    await scratch.addDocuments([DOCS[6]!], { primaryKey: 'id' }).waitTask();
    const swap = await client.swapIndexes([{ indexes: [uid, other], rename: false }]).waitTask();
    expect(swap.status).toBe('succeeded');
    expect(ids((await parts.search('')).hits)).toEqual(['a7']);
    expect((await scratch.search('')).estimatedTotalHits).toBe(DOCS.length);
    const back = await client.swapIndexes([{ indexes: [uid, other], rename: false }]).waitTask();
    expect(back.status).toBe('succeeded');
    expect((await parts.search('')).estimatedTotalHits).toBe(DOCS.length);
    const missing = await client.swapIndexes([{ indexes: [uid, `contract_missing_${tag}`], rename: false }]).waitTask();
    expect(missing.status).toBe('failed');
    expect(missing.error?.code).toBe('index_not_found');
  });

  it('reports a missing index as index_not_found and a failed task as failed', async () => {
    await expect(client.index(`contract_missing_${tag}`).search('plug')).rejects.toMatchObject({
      cause: { code: 'index_not_found', type: 'invalid_request' },
      response: { status: 404 },
    });
    const duplicate = await client.createIndex(uid).waitTask();
    expect(duplicate.status).toBe('failed');
    expect(duplicate.error).toMatchObject({ code: 'index_already_exists', type: 'invalid_request' });
    expect(typeof duplicate.error?.link).toBe('string');
  });

  it('with a master key refuses a wrong key (403) and a missing one (401); without one, serves anyone', async () => {
    const wrong = new Meilisearch({ host, apiKey: 'not-the-key' }).index(uid).search('plug');
    const none = new Meilisearch({ host }).index(uid).search('plug');
    if (apiKey) {
      await expect(wrong).rejects.toMatchObject({ cause: { code: 'invalid_api_key', type: 'auth' }, response: { status: 403 } });
      await expect(none).rejects.toMatchObject({
        cause: { code: 'missing_authorization_header', type: 'auth' },
        response: { status: 401 },
      });
    } else {
      expect((await none).hits.length).toBeGreaterThan(0);
      await wrong.catch(() => undefined);
    }
  });
});
