/**
 * The index is never empty: PartSearchIndex.rebuild() builds a new index beside the live one and
 * swaps it in, so a search during a rebuild answers from the old one. Runs on an index of its own,
 * built from the demo catalog, against the stand-in (or a real Meilisearch with MEILI_HOST set).
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { PartSearchIndex } from '../../../server/search/search-index';
import { createTestApp, type TestApp } from '../../helpers/test-app';

describe('PartSearchIndex.rebuild', () => {
  let t: TestApp;
  let index: PartSearchIndex;

  beforeAll(async () => {
    t = await createTestApp();
    index = new PartSearchIndex(inject('meiliHost'), inject('meiliApiKey') || undefined, `parts_swap_${randomUUID().slice(0, 8)}`);
  });
  afterAll(async () => {
    await index.client.deleteIndex(index.uid).waitTask();
    await t.close();
  });

  it('builds an index that did not exist, then answers every search during a second rebuild from the old one', async () => {
    const parts = Number(
      (await t.deps.dataSource.query(`SELECT count(*)::int AS n FROM part p JOIN brand b ON b.id = p.brand_id AND b.ours`))[0].n,
    );
    expect(await index.rebuild(t.deps.dataSource)).toBe(parts);

    let done = false;
    const rebuild = index.rebuild(t.deps.dataSource).finally(() => (done = true));
    const answers: string[][] = [];
    while (!done) {
      const r = await index.search('QWIC3140', { filter: ['current = true'] });
      answers.push(r.hits.map((h) => h.partNumber));
    }
    expect(await rebuild).toBe(parts);
    // Several searches ran while the rebuild was under way, and each found the part.
    expect(answers.length).toBeGreaterThan(3);
    expect(answers.filter((a) => !a.includes('QW-IC 3140'))).toEqual([]);
    expect((await index.search('', { limit: 0 })).estimatedTotalHits).toBe(parts);
  });

  it('lets two rebuilds from one process run one after the other, each swapping in a whole index', async () => {
    const [a, b] = await Promise.all([index.rebuild(t.deps.dataSource), index.rebuild(t.deps.dataSource)]);
    expect(a).toBe(b);
    expect((await index.search('', { limit: 0 })).estimatedTotalHits).toBe(a);
  });
});
