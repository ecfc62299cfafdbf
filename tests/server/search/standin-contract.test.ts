/**
 * Contract tests for the search stand-in, through the real `meilisearch` SDK. With MEILI_HOST set
 * (and MEILI_API_KEY when the server has a master key) the same tests run against a real
 * Meilisearch instead, so they only assert behaviour both give. Data is invented.
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Meilisearch, type Index, type Task } from 'meilisearch';
import { startSearchStandin, type RunningSearchStandin } from '../../../server/search-standin/server';

interface PartDoc {
  id: string;
  name: string;
  brand: string;
  category: string;
  priceCents: number;
  heatRange: number | null;
  numbers: string[];
  vehicles: string[];
}

const PARTS: PartDoc[] = [
  {
    id: 'p01',
    name: 'Iridium spark plug',
    brand: 'Orvane',
    category: 'spark-plug',
    priceCents: 1250,
    heatRange: 6,
    numbers: ['QX7731', 'ORV1001', '55120'],
    vehicles: ['alder', 'birch'],
  },
  {
    id: 'p02',
    name: 'Iridium spark plug long reach',
    brand: 'Orvane',
    category: 'spark-plug',
    priceCents: 1390,
    heatRange: 7,
    numbers: ['QX77315', 'ORV1002'],
    vehicles: ['birch'],
  },
  {
    id: 'p03',
    name: 'Copper core spark plug',
    brand: 'Telrix',
    category: 'spark-plug',
    priceCents: 420,
    heatRange: 5,
    numbers: ['TRL5520', 'TRL5521'],
    vehicles: ['cedar'],
  },
  {
    id: 'p04',
    name: 'Platinum spark plug',
    brand: 'Telrix',
    category: 'spark-plug',
    priceCents: 890,
    heatRange: 6,
    numbers: ['TRL6640'],
    vehicles: ['alder', 'cedar'],
  },
  {
    id: 'p05',
    name: 'Pencil ignition coil',
    brand: 'Quillon',
    category: 'coil',
    priceCents: 5400,
    heatRange: null,
    numbers: ['QLN88012', 'QLN88013'],
    vehicles: ['alder'],
  },
  {
    id: 'p06',
    name: 'Coil pack four tower',
    brand: 'Quillon',
    category: 'coil',
    priceCents: 7900,
    heatRange: null,
    numbers: ['QLN90400'],
    vehicles: ['dogwood'],
  },
  {
    id: 'p07',
    name: 'Ignition lead set',
    brand: 'Orvane',
    category: 'lead',
    priceCents: 3100,
    heatRange: null,
    numbers: ['ORV3300'],
    vehicles: ['birch', 'cedar'],
  },
  {
    id: 'p08',
    name: 'Silicone ignition lead',
    brand: 'Telrix',
    category: 'lead',
    priceCents: 2650,
    heatRange: null,
    numbers: ['TRL7001'],
    vehicles: ['dogwood'],
  },
  {
    id: 'p09',
    name: 'Double platinum spark plug',
    brand: 'Quillon',
    category: 'spark-plug',
    priceCents: 1100,
    heatRange: 8,
    numbers: ['QLN1208'],
    vehicles: ['elm'],
  },
  {
    id: 'p10',
    name: 'Distributor cap',
    brand: 'Orvane',
    category: 'distributor',
    priceCents: 1800,
    heatRange: null,
    numbers: ['ORV4410'],
    vehicles: ['elm', 'alder'],
  },
];

const realHost = process.env.MEILI_HOST;
const runTag = randomUUID().slice(0, 8);
const partsUid = `contract_parts_${runTag}`;
const scratchUid = `contract_scratch_${runTag}`;
const createdUids = [partsUid, scratchUid, `contract_nokey_${runTag}`];

let standin: RunningSearchStandin | null = null;
let client: Meilisearch;
let apiKey: string | undefined;
let host: string;
let parts: Index<PartDoc>;
let setupTasks: Task[] = [];

function ids(hits: readonly { id: string }[]): string[] {
  return hits.map((hit) => hit.id);
}

function sortedIds(hits: readonly { id: string }[]): string[] {
  return ids(hits).sort();
}

/** The ids of PARTS that satisfy a predicate, sorted, to compare with a filtered search. */
function expectedIds(predicate: (part: PartDoc) => boolean): string[] {
  return PARTS.filter(predicate)
    .map((part) => part.id)
    .sort();
}

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
  parts = client.index<PartDoc>(partsUid);
  setupTasks = [
    await client.createIndex(partsUid, { primaryKey: 'id' }).waitTask(),
    await parts
      .updateSettings({
        filterableAttributes: ['brand', 'category', 'priceCents', 'heatRange', 'numbers', 'vehicles'],
        sortableAttributes: ['priceCents', 'name'],
      })
      .waitTask(),
    await parts.addDocuments(PARTS).waitTask(),
  ];
});

afterAll(async () => {
  if (client) {
    for (const uid of createdUids) {
      await client
        .deleteIndex(uid)
        .waitTask()
        .catch(() => undefined);
    }
  }
  await standin?.close();
});

describe('search stand-in contract (meilisearch SDK)', () => {
  it('answers health and version', async () => {
    expect(await client.health()).toEqual({ status: 'available' });
    expect(typeof (await client.getVersion()).pkgVersion).toBe('string');
  });

  it('creates an index, applies settings and indexes documents through tasks that succeed', async () => {
    expect(setupTasks.map((task) => [task.type, task.status])).toEqual([
      ['indexCreation', 'succeeded'],
      ['settingsUpdate', 'succeeded'],
      ['documentAdditionOrUpdate', 'succeeded'],
    ]);
    expect(setupTasks[2]?.details?.indexedDocuments).toBe(PARTS.length);
    const info = await client.getRawIndex(partsUid);
    expect(info.primaryKey).toBe('id');
    const settings = await parts.getSettings();
    expect(settings.sortableAttributes).toEqual(expect.arrayContaining(['priceCents', 'name']));
    expect(settings.filterableAttributes).toEqual(expect.arrayContaining(['brand', 'numbers']));
    expect(await parts.getDocument('p05')).toMatchObject({ name: 'Pencil ignition coil', numbers: ['QLN88012', 'QLN88013'] });
  });

  it('finds a part number by exact token and ranks the exact hit above a longer prefix hit', async () => {
    const result = await parts.search('QX7731');
    expect(ids(result.hits)[0]).toBe('p01');
    expect(ids(result.hits)).toContain('p02');
  });

  it('matches the last word as a prefix', async () => {
    const result = await parts.search('irid');
    expect(sortedIds(result.hits)).toEqual(['p01', 'p02']);
    const number = await parts.search('QLN880');
    expect(ids(number.hits)).toEqual(['p05']);
  });

  it('tolerates one typo in a word of five or more characters, transpositions included', async () => {
    const substitution = await parts.search('TRL5530');
    expect(ids(substitution.hits)).toContain('p03');
    const transposition = await parts.search('QX7713');
    expect(ids(transposition.hits)).toContain('p01');
    const wordTypo = await parts.search('platinun');
    expect(sortedIds(wordTypo.hits)).toEqual(['p04', 'p09']);
  });

  it('allows no typo in a word shorter than five characters', async () => {
    const result = await parts.search('coul');
    expect(result.hits).toEqual([]);
    expect(result.estimatedTotalHits).toBe(0);
  });

  it('counts a typo on the first letter as two, so a six-character word cannot have one', async () => {
    const result = await parts.search('XX7731');
    expect(result.hits).toEqual([]);
  });

  it('filters with =, !=, IN, NOT IN and TO', async () => {
    const equal = await parts.search('', { filter: 'brand = Telrix' });
    expect(sortedIds(equal.hits)).toEqual(expectedIds((p) => p.brand === 'Telrix'));

    const notEqual = await parts.search('', { filter: 'category != "spark-plug"' });
    expect(sortedIds(notEqual.hits)).toEqual(expectedIds((p) => p.category !== 'spark-plug'));

    const inList = await parts.search('', { filter: "category IN [coil, 'lead']" });
    expect(sortedIds(inList.hits)).toEqual(expectedIds((p) => p.category === 'coil' || p.category === 'lead'));

    const notIn = await parts.search('', { filter: 'brand NOT IN [Orvane, Quillon]' });
    expect(sortedIds(notIn.hits)).toEqual(expectedIds((p) => p.brand === 'Telrix'));

    const range = await parts.search('', { filter: 'priceCents 1000 TO 2000' });
    expect(sortedIds(range.hits)).toEqual(expectedIds((p) => p.priceCents >= 1000 && p.priceCents <= 2000));

    const comparison = await parts.search('', { filter: 'priceCents > 5000' });
    expect(sortedIds(comparison.hits)).toEqual(expectedIds((p) => p.priceCents > 5000));
  });

  it('combines filters with AND, OR, NOT, parentheses and the array form', async () => {
    const combined = await parts.search('', {
      filter: '(brand = Orvane OR brand = Quillon) AND NOT category = coil AND priceCents < 2000',
    });
    expect(sortedIds(combined.hits)).toEqual(
      expectedIds((p) => (p.brand === 'Orvane' || p.brand === 'Quillon') && p.category !== 'coil' && p.priceCents < 2000),
    );

    const arrayForm = await parts.search('', { filter: [['brand = Orvane', 'brand = Quillon'], 'category = "spark-plug"'] });
    expect(sortedIds(arrayForm.hits)).toEqual(
      expectedIds((p) => (p.brand === 'Orvane' || p.brand === 'Quillon') && p.category === 'spark-plug'),
    );

    const withQuery = await parts.search('spark', { filter: 'heatRange >= 7' });
    expect(sortedIds(withQuery.hits)).toEqual(['p02', 'p09']);
  });

  it('matches an array field when any element matches', async () => {
    const vehicle = await parts.search('', { filter: 'vehicles = cedar' });
    expect(sortedIds(vehicle.hits)).toEqual(expectedIds((p) => p.vehicles.includes('cedar')));
    const number = await parts.search('', { filter: 'numbers IN [TRL5521, QLN90400]' });
    expect(sortedIds(number.hits)).toEqual(['p03', 'p06']);
  });

  it('filters on EXISTS and IS NULL', async () => {
    const isNull = await parts.search('', { filter: 'heatRange IS NULL' });
    expect(sortedIds(isNull.hits)).toEqual(expectedIds((p) => p.heatRange === null));
    const notNull = await parts.search('', { filter: 'heatRange IS NOT NULL AND heatRange EXISTS' });
    expect(sortedIds(notNull.hits)).toEqual(expectedIds((p) => p.heatRange !== null));
  });

  it('counts facet values over the whole filtered result set, with numeric stats', async () => {
    const result = await parts.search('', { filter: 'category = "spark-plug"', facets: ['brand', 'priceCents'], limit: 1 });
    expect(result.hits).toHaveLength(1);
    expect(result.facetDistribution?.brand).toEqual({ Orvane: 2, Quillon: 1, Telrix: 2 });
    expect(result.facetStats?.priceCents).toEqual({ min: 420, max: 1390 });

    const arrays = await parts.search('', { facets: ['vehicles'] });
    expect(arrays.facetDistribution?.vehicles).toEqual({ alder: 4, birch: 3, cedar: 3, dogwood: 2, elm: 2 });
  });

  it('sorts ascending and descending', async () => {
    const byPrice = [...PARTS].sort((a, b) => a.priceCents - b.priceCents).map((p) => p.id);
    const ascending = await parts.search('', { sort: ['priceCents:asc'] });
    expect(ids(ascending.hits)).toEqual(byPrice);
    const descending = await parts.search('', { sort: ['priceCents:desc'] });
    expect(ids(descending.hits)).toEqual([...byPrice].reverse());
    const queryAndSort = await parts.search('spark plug', { sort: ['priceCents:desc'], filter: 'brand = Telrix' });
    expect(ids(queryAndSort.hits)).toEqual(['p04', 'p03']);
  });

  it('pages with limit and offset and reports estimatedTotalHits', async () => {
    const byPrice = [...PARTS].sort((a, b) => a.priceCents - b.priceCents).map((p) => p.id);
    const page = await parts.search('', { sort: ['priceCents:asc'], limit: 3, offset: 2 });
    expect(ids(page.hits)).toEqual(byPrice.slice(2, 5));
    expect(page.limit).toBe(3);
    expect(page.offset).toBe(2);
    expect(page.estimatedTotalHits).toBe(PARTS.length);
    const beyond = await parts.search('', { offset: 50 });
    expect(beyond.hits).toEqual([]);
    expect(beyond.estimatedTotalHits).toBe(PARTS.length);
    const defaults = await parts.search('');
    expect(defaults.limit).toBe(20);
  });

  it('pages with page and hitsPerPage and reports totalHits and totalPages', async () => {
    const byPrice = [...PARTS].sort((a, b) => a.priceCents - b.priceCents).map((p) => p.id);
    const page = await parts.search('', { sort: ['priceCents:asc'], page: 2, hitsPerPage: 3 });
    expect(ids(page.hits)).toEqual(byPrice.slice(3, 6));
    expect(page).toMatchObject({ page: 2, hitsPerPage: 3, totalHits: PARTS.length, totalPages: 4 });
  });

  it('returns only the asked attributes', async () => {
    const result = await parts.search('QLN90400', { attributesToRetrieve: ['id', 'brand'] });
    expect(result.hits).toEqual([{ id: 'p06', brand: 'Quillon' }]);
  });

  it('rejects a filter on a non-filterable attribute and a malformed filter', async () => {
    await expect(parts.search('', { filter: 'name = plug' })).rejects.toMatchObject({
      cause: { code: 'invalid_search_filter', type: 'invalid_request' },
    });
    await expect(parts.search('', { filter: 'brand = ' })).rejects.toMatchObject({ cause: { code: 'invalid_search_filter' } });
    await expect(parts.search('', { sort: ['heatRange:asc'] })).rejects.toMatchObject({ cause: { code: 'invalid_search_sort' } });
  });

  it('reports index_not_found for a missing index', async () => {
    const missing = `contract_missing_${runTag}`;
    await expect(client.index(missing).search('plug')).rejects.toMatchObject({
      cause: { code: 'index_not_found', type: 'invalid_request' },
      response: { status: 404 },
    });
    await expect(client.getRawIndex(missing)).rejects.toMatchObject({ cause: { code: 'index_not_found' } });
  });

  it('reports a failed task as failed, with a Meilisearch error object', async () => {
    const duplicate = await client.createIndex(partsUid).waitTask();
    expect(duplicate.status).toBe('failed');
    expect(duplicate.error).toMatchObject({ code: 'index_already_exists', type: 'invalid_request' });
    expect(typeof duplicate.error?.message).toBe('string');
    expect(typeof duplicate.error?.link).toBe('string');

    const noKeyUid = `contract_nokey_${runTag}`;
    const noPrimaryKey = await client
      .index(noKeyUid)
      .addDocuments([{ title: 'no identifier here' }])
      .waitTask();
    expect(noPrimaryKey.status).toBe('failed');
    expect(noPrimaryKey.error?.code).toBe('index_primary_key_no_candidate_found');

    const polled = await client.tasks.getTask(duplicate.uid);
    expect(polled.status).toBe('failed');
  });

  it('deletes documents one by one, in batches and all at once', async () => {
    const scratch = client.index<PartDoc>(scratchUid);
    expect((await scratch.addDocuments(PARTS, { primaryKey: 'id' }).waitTask()).status).toBe('succeeded');

    expect((await scratch.deleteDocument('p01').waitTask()).status).toBe('succeeded');
    await expect(scratch.getDocument('p01')).rejects.toMatchObject({ cause: { code: 'document_not_found' }, response: { status: 404 } });

    const batch = await scratch.deleteDocuments(['p02', 'p03', 'does-not-exist']).waitTask();
    expect(batch.status).toBe('succeeded');
    expect(batch.details?.deletedDocuments).toBe(2);
    const afterBatch = await scratch.search('spark');
    expect(ids(afterBatch.hits)).not.toContain('p02');
    expect(ids(afterBatch.hits)).not.toContain('p03');
    expect((await scratch.search('')).estimatedTotalHits).toBe(PARTS.length - 3);

    expect((await scratch.deleteAllDocuments().waitTask()).status).toBe('succeeded');
    const empty = await scratch.search('');
    expect(empty.hits).toEqual([]);
    expect(empty.estimatedTotalHits).toBe(0);
  });

  it('replaces documents on POST and merges fields on PUT', async () => {
    const scratch = client.index<PartDoc>(scratchUid);
    const [first] = PARTS;
    if (!first) throw new Error('fixture is empty');
    await scratch.addDocuments([first]).waitTask();
    await scratch.updateDocuments([{ id: first.id, priceCents: 999 }]).waitTask();
    expect(await scratch.getDocument(first.id)).toMatchObject({ name: first.name, priceCents: 999 });
    await scratch.addDocuments([{ ...first, name: 'Renamed plug' }]).waitTask();
    const replaced = await scratch.search('renamed');
    expect(ids(replaced.hits)).toEqual([first.id]);
    expect((await scratch.search('iridium')).hits).toEqual([]);
  });

  it('answers several queries in one multi-search', async () => {
    const response = await client.multiSearch({
      queries: [
        { indexUid: partsUid, q: 'coil', filter: 'brand = Quillon' },
        { indexUid: partsUid, q: '', sort: ['priceCents:desc'], limit: 1 },
      ],
    });
    expect(response.results).toHaveLength(2);
    expect(response.results[0]?.indexUid).toBe(partsUid);
    expect(sortedIds(response.results[0]?.hits as PartDoc[])).toEqual(['p05', 'p06']);
    expect(ids(response.results[1]?.hits as PartDoc[])).toEqual(['p06']);
    await expect(client.multiSearch({ queries: [{ indexUid: `contract_missing_${runTag}`, q: 'x' }] })).rejects.toMatchObject({
      cause: { code: 'index_not_found' },
    });
  });

  it('refuses a wrong API key when the server wants one', async ({ skip }) => {
    if (!apiKey) skip();
    const intruder = new Meilisearch({ host, apiKey: 'not-the-key' });
    await expect(intruder.index(partsUid).search('plug')).rejects.toMatchObject({
      cause: { code: 'invalid_api_key', type: 'auth' },
      response: { status: 403 },
    });
  });
});
