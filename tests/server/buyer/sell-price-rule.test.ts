import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PartDetail } from '../../../shared/schemas/parts';
import type { CommitPriceListResponse, PriceList, PriceListChanges } from '../../../shared/schemas/price-lists';
import { counterPricesMessage, type SellPriceRulesResponse } from '../../../shared/schemas/sell-price';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { newSupplier, post, stage, type Signed } from '../../helpers/price-list-api';
import { csv, runTag, STANDARD_HEADER } from '../../helpers/price-list-files';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

/**
 * The sell-price rule: the brand's preferred supplier wins over a lower list price from another
 * supplier; without a preference the lowest list price wins. Each test makes its own brand, so
 * its rule moves no price another test reads.
 */
describe('the sell-price rule', () => {
  let t: TestApp;
  let buyer: Signed;
  let clerk: Signed;

  beforeAll(async () => {
    t = await createTestApp();
    buyer = await signIn(t.app, (await makeUser(t.deps.dataSource, 'buyer')).email, TEST_PASSWORD);
    clerk = await signIn(t.app, (await makeUser(t.deps.dataSource, 'clerk')).email, TEST_PASSWORD);
  });
  afterAll(() => t.close());

  const file = (brand: string, number: string, cost: string, list: string) =>
    csv([STANDARD_HEADER, [number, brand, `Coil ${number}`, cost, list, '0.00', 1, null, null, 'coil']]);

  async function commitList(supplierId: string, brand: string, number: string, cost: string, list: string) {
    const staged = await stage(buyer, { supplierId, file: file(brand, number, cost, list), fileName: `${list}.csv` });
    const res = await post(buyer, `/api/price-lists/${staged.id}/commit`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    return (res.body as CommitPriceListResponse).counterPrices;
  }

  async function partDetail(partNumber: string): Promise<PartDetail> {
    const rows = (await t.deps.dataSource.query(`SELECT id FROM part WHERE part_number = $1`, [partNumber])) as { id: string }[];
    const res = await clerk.agent.get(`/api/parts/${rows[0]!.id}`);
    expect(res.status).toBe(200);
    return res.body as PartDetail;
  }

  it('sells at the lowest list price by default, at the preferred supplier when the buyer picks one, and says so after each commit', async () => {
    const tag = runTag();
    const brand = `Tarnholt ${tag}`;
    const number = `TH-${tag}`;
    const created = await post(buyer, '/api/brands', { name: brand });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const brandId = (created.body as { brand: { id: string } }).brand.id;
    const a = await newSupplier(buyer, 'Rule A');
    const b = await newSupplier(buyer, 'Rule B');

    // A alone: A's price is the one sold.
    expect(await commitList(a.id, brand, number, '10.00', '20.00')).toEqual({ partsPriced: 1, sellingHere: 1 });
    // B lists it lower: with no preference, the lowest list wins, and B's commit says the Counter moved.
    const bFirst = await commitList(b.id, brand, number, '9.00', '18.00');
    expect(bFirst).toEqual({ partsPriced: 1, sellingHere: 1 });
    expect(counterPricesMessage(bFirst)).toMatch(/now sells all 1 parts/);
    let detail = await partDetail(number);
    expect(detail.price?.listCents).toBe(1800);
    expect(detail.sellPriceBasis).toEqual({ supplierId: b.id, supplier: b.name, reason: 'lowest-list', brand });

    // The buyer prefers A for this brand: A's higher list price is sold, and everyone can read the rule.
    const set = await buyer.agent.put(`/api/sell-price-rules/${brandId}`).set('x-csrf-token', buyer.token).send({ supplierId: a.id });
    expect(set.status, JSON.stringify(set.body)).toBe(200);
    await clerk.agent.put(`/api/sell-price-rules/${brandId}`).set('x-csrf-token', clerk.token).send({ supplierId: null }).expect(403);
    const rules = (await clerk.agent.get('/api/sell-price-rules').expect(200)).body as SellPriceRulesResponse;
    expect(rules.rules.find((r) => r.brandId === brandId)).toMatchObject({ supplierId: a.id, supplier: a.name });
    detail = await partDetail(number);
    expect(detail.price?.listCents).toBe(2000);
    expect(detail.sellPriceBasis).toMatchObject({ supplierId: a.id, reason: 'preferred-supplier' });

    // B lowers its list again: the Counter does not move, and B's commit message says so.
    const bSecond = await commitList(b.id, brand, number, '8.00', '17.00');
    expect(bSecond).toEqual({ partsPriced: 1, sellingHere: 0 });
    expect(counterPricesMessage(bSecond)).toMatch(/did not change/);
    expect((await partDetail(number)).price?.listCents).toBe(2000);
    // A's new list is sold at once.
    expect(await commitList(a.id, brand, number, '10.50', '21.00')).toEqual({ partsPriced: 1, sellingHere: 1 });
    expect((await partDetail(number)).price?.listCents).toBe(2100);

    // Back to the lowest list price.
    await buyer.agent.put(`/api/sell-price-rules/${brandId}`).set('x-csrf-token', buyer.token).send({ supplierId: null }).expect(200);
    detail = await partDetail(number);
    expect(detail.price?.listCents).toBe(1700);
    expect(detail.sellPriceBasis).toMatchObject({ supplierId: b.id, reason: 'lowest-list' });
  });

  it('reads a pipe-delimited file, guessed or chosen', async () => {
    const tag = runTag();
    const supplier = await newSupplier(buyer, 'Pipe');
    const pipe = csv(
      [
        STANDARD_HEADER,
        [`QW-IC P${tag}1`, 'Quaywell', 'Coil, long boot', '21.00', '42.00', '0.00', 1, null, null, 'coil'],
        [`QW-IC P${tag}2`, 'Quaywell', 'Coil', '22.00', '44.00', '0.00', 1, null, null, 'coil'],
        // The demo catalog's QW-SP 1406 (seed/data/parts.ts), printed the supplier's way.
        ['qw-sp1406', 'Quaywell', 'Plug', '3.30', '7.59', '0.00', 4, null, null, 'plug'],
      ],
      { delimiter: '|' },
    );
    const guessed = await stage(buyer, { supplierId: supplier.id, file: pipe, fileName: 'pipe.txt' });
    expect(guessed.delimiter).toBe('|');
    expect(guessed.counts).toMatchObject({ total: 3, new: 2, changed: 1, rejected: 0 });
    // The preview shows the catalog number the printed one matched.
    const changes = (await buyer.agent.get(`/api/price-lists/${guessed.id}/changes?type=changed`).expect(200)).body as PriceListChanges;
    expect(changes.changes.map((c) => [c.partNumber, c.catalogNumber])).toEqual([['qw-sp1406', 'QW-SP 1406']]);

    // Chosen explicitly on upload (a file whose first lines would mislead the guess).
    const chosen = await buyer.agent
      .post('/api/price-lists')
      .set('x-csrf-token', buyer.token)
      .field('supplierId', (await newSupplier(buyer, 'Pipe chosen')).id)
      .field('delimiter', '|')
      .attach('file', Buffer.from(pipe), { filename: 'pipe.txt', contentType: 'text/plain' });
    expect(chosen.status, JSON.stringify(chosen.body)).toBe(201);
    expect((chosen.body as PriceList).counts).toMatchObject({ new: 2, rejected: 0 });

    // Read again with the wrong delimiter, the file has one column and is refused; with pipe it reads again.
    const wrong = await post(buyer, `/api/price-lists/${guessed.id}/preview`, { delimiter: ';' });
    expect(wrong.status).toBe(400);
    const again = await post(buyer, `/api/price-lists/${guessed.id}/preview`, { delimiter: '|' });
    expect(again.status, JSON.stringify(again.body)).toBe(200);
    expect((again.body as PriceList).counts).toMatchObject({ new: 2 });
  });
});
