import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Mapping } from '../../../shared/price-list/mapping';
import type { PriceList, PriceListChange, PriceListChanges, PriceListErrors } from '../../../shared/schemas/price-lists';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { post, SAMPLE, sampleFile, stage, supplierWithSeedPrices, type Signed } from '../../helpers/price-list-api';
import { runTag } from '../../helpers/price-list-files';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

/**
 * The preview of the three sample files against the demo suppliers' prices as seeded. Every
 * expected number comes from seed/csv/README.md and seed/data/suppliers.ts. The prices are copied
 * onto suppliers of the test's own, and the clean file's four new numbers carry a tag of this
 * run: the Price lists journey commits that file, and the tests must not depend on whether it ran.
 */

const NEW_NUMBERS = ['QW-IC 3162', 'QW-CP 5206', 'QW-SP 1418', 'NR/IR 2210'];

const STANDARD_MAPPING: Mapping = {
  'Part Number': 'partNumber',
  Brand: 'brand',
  Description: 'description',
  Cost: 'cost',
  List: 'list',
  Core: 'core',
  'Pack Qty': 'packQty',
  GTIN: 'gtin',
  Supersedes: 'supersedes',
  Kind: 'kind',
};

async function changesOf(buyer: Signed, id: string, query: Record<string, string> = {}): Promise<PriceListChange[]> {
  const res = await buyer.agent
    .get(`/api/price-lists/${id}/changes`)
    .query({ limit: 1000, ...query })
    .expect(200);
  return (res.body as PriceListChanges).changes;
}

describe('preview of the sample files', () => {
  let t: TestApp;
  let buyer: Signed;
  let pellworth: string;
  let brackwater: string;
  const tag = runTag();
  const fresh = (n: string) => `${n}-${tag}`;
  const cleanFile = () => {
    let text = sampleFile(SAMPLE.clean).toString('utf8');
    for (const n of NEW_NUMBERS) text = text.replace(`${n},`, `${fresh(n)},`);
    return Buffer.from(text);
  };

  beforeAll(async () => {
    t = await createTestApp();
    buyer = await signIn(t.app, (await makeUser(t.deps.dataSource, 'buyer')).email, TEST_PASSWORD);
    pellworth = (await supplierWithSeedPrices(t.deps.dataSource, buyer, 'pellworth')).id;
    brackwater = (await supplierWithSeedPrices(t.deps.dataSource, buyer, 'brackwater')).id;
  });
  afterAll(() => t.close());

  describe('the clean file, against Pellworth', () => {
    let list: PriceList;
    beforeAll(async () => {
      list = await stage(buyer, { supplierId: pellworth, file: cleanFile(), fileName: SAMPLE.clean });
    });

    it('guesses every column from its header', () => {
      expect(list.mappingSource).toBe('guessed');
      expect(list.mapping).toEqual(STANDARD_MAPPING);
      expect(list.columns).toEqual(Object.keys(STANDARD_MAPPING));
      expect(list).toMatchObject({ delimiter: ',', encoding: 'utf-8', status: 'staged', stale: false, fileName: SAMPLE.clean });
      expect(list.sha256).toMatch(/^[0-9a-f]{64}$/);
    });

    it('counts 4 new, 5 changed, 31 unchanged, one supersession and one move above 15 %', () => {
      expect(list.counts).toEqual({ total: 40, new: 4, changed: 5, unchanged: 31, rejected: 0, firstPrices: 0, supersessions: 1 });
      expect(list.flagged).toBe(1);
      expect(list.flagThresholdPct).toBe(15);
    });

    it('shows each price change old → new with its percent', async () => {
      const changed = await changesOf(buyer, list.id, { type: 'changed' });
      const view = changed.map((c) => [
        c.partNumber,
        c.oldCostCents,
        c.newCostCents,
        c.costChangePct,
        c.oldListCents,
        c.newListCents,
        c.flagged,
      ]);
      expect(view).toEqual([
        ['QW-IC 3101', 2450, 2520, 2.9, 4999, 5199, false],
        ['QW-CP 5202', 3480, 3390, -2.6, 6999, 6999, false],
        ['QW-SP 1406', 310, 325, 4.8, 749, 749, false],
        ['QW-SP 1017', 540, 540, 0, 1249, 1299, false],
        ['NR/IR 2208', 640, 760, 18.8, 1499, 1699, true],
      ]);
      const flagged = await changesOf(buyer, list.id, { flagged: 'true' });
      expect(flagged.map((c) => c.partNumber)).toEqual(['NR/IR 2208']);
    });

    it('sorts a table by the size of a move or by number, ties in file order, and refuses a column it does not sort by', async () => {
      const byMove = await changesOf(buyer, list.id, { type: 'changed', sort: 'costChange', dir: 'desc' });
      expect(byMove.map((c) => [c.partNumber, c.costChangePct])).toEqual([
        ['NR/IR 2208', 18.8],
        ['QW-SP 1406', 4.8],
        ['QW-IC 3101', 2.9],
        ['QW-SP 1017', 0],
        ['QW-CP 5202', -2.6],
      ]);
      const byNumber = await changesOf(buyer, list.id, { type: 'changed', sort: 'partNumber' });
      expect(byNumber.map((c) => c.partNumber)).toEqual(['NR/IR 2208', 'QW-CP 5202', 'QW-IC 3101', 'QW-SP 1017', 'QW-SP 1406']);
      const lastLines = await changesOf(buyer, list.id, { type: 'unchanged', sort: 'line', dir: 'desc', limit: '3' });
      const unchangedLines = (await changesOf(buyer, list.id, { type: 'unchanged' })).map((c) => c.line);
      expect(lastLines.map((c) => c.line)).toEqual(unchangedLines.slice(-3).reverse());
      const bad = await buyer.agent.get(`/api/price-lists/${list.id}/changes`).query({ sort: 'sha256' });
      expect(bad.status).toBe(400);
      expect(bad.body.error.details[0].field).toBe('sort');
    });

    it('lists the new numbers, each without a spec, and the supersession', async () => {
      const added = await changesOf(buyer, list.id, { type: 'new' });
      expect(added.map((c) => [c.partNumber, c.partId, c.specStored])).toEqual(NEW_NUMBERS.map((n) => [fresh(n), null, false]));
      expect(added.find((c) => c.partNumber === fresh('QW-CP 5206'))?.newCoreCents).toBe(1500);
      const supersessions = await changesOf(buyer, list.id, { type: 'supersession' });
      expect(supersessions.map((c) => [c.partNumber, c.supersedes, c.supersession])).toEqual([[fresh('QW-IC 3162'), 'QW-IC 3161', 'link']]);
    });

    it('matches numbers printed differently from the catalog', async () => {
      const unchanged = await changesOf(buyer, list.id, { type: 'unchanged' });
      expect(unchanged).toHaveLength(31);
      for (const printed of ['QWIC 3170', 'qw-sp 1407', 'NR-IR 4406']) {
        const row = unchanged.find((c) => c.partNumber === printed);
        expect(row?.partId, printed).toEqual(expect.any(String));
      }
    });

    it('pages the tables', async () => {
      const res = await buyer.agent
        .get(`/api/price-lists/${list.id}/changes`)
        .query({ type: 'unchanged', offset: 30, limit: 10 })
        .expect(200);
      expect((res.body as PriceListChanges).total).toBe(31);
      expect((res.body as PriceListChanges).changes).toHaveLength(1);
    });
  });

  it('the other layout, against Brackwater: semicolons, quotes and a line break inside a field', async () => {
    const list = await stage(buyer, { supplierId: brackwater, file: sampleFile(SAMPLE.otherLayout) });
    expect(list.mapping).toEqual({
      Mfr: 'brand',
      'Item No': 'partNumber',
      Barcode: 'gtin',
      Desc: 'description',
      'Qty/Pack': 'packQty',
      Net: 'cost',
      Retail: 'list',
      'Core Chg': 'core',
    });
    expect(list.delimiter).toBe(';');
    expect(list.counts).toEqual({ total: 24, new: 0, changed: 3, unchanged: 21, rejected: 0, firstPrices: 0, supersessions: 0 });
    const changed = await changesOf(buyer, list.id, { type: 'changed' });
    expect(changed.map((c) => [c.partNumber, c.oldCostCents, c.newCostCents, c.costChangePct])).toEqual([
      ['QWIC-3120', 3099, 3190, 2.9],
      ['QWIC-3180', 3006, 2950, -1.9],
      ['QWSP-1217', 499, 540, 8.2],
    ]);
    const all = await changesOf(buyer, list.id);
    expect(all.find((c) => c.partNumber === 'QWIC-3160')?.description).toBe('Coil-on-plug ignition coil; 3-pin "E" connector');
    expect(all.find((c) => c.partNumber === 'QWCP-5203')?.description).toBe(
      'Coil pack, remanufactured\nCore charge refunded on return of the old pack',
    );
    // The record after the embedded line break is on line 14 of the file (26 lines, 25 records).
    expect(all.find((c) => c.partNumber === 'QWSP-1406')?.line).toBe(14);
  });

  it('the file with bad rows, against Pellworth: 9 unchanged, 7 rejected on the lines the README lists', async () => {
    const list = await stage(buyer, { supplierId: pellworth, file: sampleFile(SAMPLE.badRows) });
    expect(list.mapping).toEqual(STANDARD_MAPPING);
    expect(list.counts).toEqual({ total: 16, new: 0, changed: 0, unchanged: 9, rejected: 7, firstPrices: 0, supersessions: 0 });
    const { errors } = (await buyer.agent.get(`/api/price-lists/${list.id}/errors`).expect(200)).body as PriceListErrors;
    expect(errors.map((e) => [e.line, e.column])).toEqual([
      [4, 'Cost'],
      [5, 'Part Number'],
      [6, 'List'],
      [8, 'GTIN'],
      [10, 'Kind'],
      [12, 'Part Number'],
      [15, 'Part Number'],
    ]);
    const errorsBy = async (query: Record<string, string>) =>
      ((await buyer.agent.get(`/api/price-lists/${list.id}/errors`).query(query).expect(200)).body as PriceListErrors).errors.map((e) => [
        e.line,
        e.column,
      ]);
    expect(await errorsBy({ sort: 'line', dir: 'desc' })).toEqual([
      [15, 'Part Number'],
      [12, 'Part Number'],
      [10, 'Kind'],
      [8, 'GTIN'],
      [6, 'List'],
      [5, 'Part Number'],
      [4, 'Cost'],
    ]);
    expect(await errorsBy({ sort: 'column' })).toEqual([
      [4, 'Cost'],
      [8, 'GTIN'],
      [10, 'Kind'],
      [6, 'List'],
      [5, 'Part Number'],
      [12, 'Part Number'],
      [15, 'Part Number'],
    ]);
    expect(errors.find((e) => e.line === 5)?.message).toContain('line 12');
    expect(errors.find((e) => e.line === 12)?.message).toContain('line 5');
    const unchanged = await changesOf(buyer, list.id, { type: 'unchanged' });
    expect(unchanged.map((c) => c.line)).toEqual([2, 3, 7, 9, 11, 13, 14, 16, 17]);
    // Kept, defused behind an apostrophe (seed/csv/README.md).
    expect(unchanged.find((c) => c.line === 13)?.description).toBe("'=SUM(D2:D9)");
  });

  it('a new mapping confirmed by the buyer re-reads the kept file', async () => {
    // Cost and list swapped by mistake: every known part then looks changed.
    const wrong: Mapping = { ...STANDARD_MAPPING, Cost: 'list', List: 'cost' };
    const list = await stage(buyer, { supplierId: pellworth, file: cleanFile(), mapping: wrong });
    expect(list.mappingSource).toBe('given');
    expect(list.counts).toMatchObject({ new: 4, changed: 36, unchanged: 0 });
    const res = await post(buyer, `/api/price-lists/${list.id}/preview`, { mapping: STANDARD_MAPPING });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const again = res.body as PriceList;
    expect(again.mapping).toEqual(STANDARD_MAPPING);
    expect(again.counts).toEqual({ total: 40, new: 4, changed: 5, unchanged: 31, rejected: 0, firstPrices: 0, supersessions: 1 });
    const changed = await changesOf(buyer, list.id, { type: 'changed' });
    expect(changed.find((c) => c.partNumber === 'QW-IC 3101')).toMatchObject({ oldCostCents: 2450, newCostCents: 2520 });
    // A mapping that leaves a required field out is refused, and the staging stays as it was.
    const bad = await post(buyer, `/api/price-lists/${list.id}/preview`, { mapping: { ...STANDARD_MAPPING, Cost: null } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.reason).toBe('missing-column');
    const after = (await buyer.agent.get(`/api/price-lists/${list.id}`).expect(200)).body as PriceList;
    expect(after.counts).toEqual(again.counts);
  });
});
