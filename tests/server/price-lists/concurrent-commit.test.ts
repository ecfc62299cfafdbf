import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { newSupplier, post, stage, type Signed } from '../../helpers/price-list-api';
import { isFullyCommitted, listState } from '../../helpers/price-list-checks';
import { bulkCsv, bulkRows, runTag } from '../../helpers/price-list-files';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

const ROWS = 3000;

describe('two commits for one supplier at the same time', () => {
  let t: TestApp;
  let buyer: Signed;
  let other: Signed;

  beforeAll(async () => {
    t = await createTestApp();
    buyer = await signIn(t.app, (await makeUser(t.deps.dataSource, 'buyer')).email, TEST_PASSWORD);
    other = await signIn(t.app, (await makeUser(t.deps.dataSource, 'buyer')).email, TEST_PASSWORD);
  });
  afterAll(() => t.close());

  it('are serialised: one commits, the other must be previewed again, and no price is lost', async () => {
    const tag = runTag();
    const supplier = await newSupplier(buyer, 'Concurrent');
    // Same parts, every price different between the two lists; both staged against the same catalog.
    const one = await stage(buyer, { supplierId: supplier.id, file: bulkCsv(bulkRows(tag, ROWS, 1)) });
    const two = await stage(other, { supplierId: supplier.id, file: bulkCsv(bulkRows(tag, ROWS, 2)) });
    expect(one.counts?.new).toBe(ROWS);
    expect(two.counts?.new).toBe(ROWS);

    const [a, b] = await Promise.all([post(buyer, `/api/price-lists/${one.id}/commit`), post(other, `/api/price-lists/${two.id}/commit`)]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const [winner, loser] = a.status === 200 ? [one, two] : [two, one];
    const refusal = a.status === 409 ? a : b;
    expect(refusal.body.error.message).toMatch(/preview it again|being processed/);

    const won = await listState(t.deps.dataSource, winner.id);
    expect(won).toMatchObject({ status: 'committed', accepted: ROWS, pricesFromList: ROWS, pricesMatching: ROWS, newPartsPresent: ROWS });
    expect(await listState(t.deps.dataSource, loser.id)).toMatchObject({ status: 'staged', pricesFromList: 0 });

    // The later list, compared again, replaces every price of the earlier one.
    const previewed = await post(buyer, `/api/price-lists/${loser.id}/preview`);
    expect(previewed.status).toBe(200);
    expect(previewed.body.counts).toMatchObject({ new: 0, changed: ROWS });
    expect((await post(buyer, `/api/price-lists/${loser.id}/commit`)).status).toBe(200);
    const last = await listState(t.deps.dataSource, loser.id);
    expect(isFullyCommitted(last)).toBe(true);
    expect(last.pricesMatching).toBe(ROWS);
    const count = (await t.deps.dataSource.query(`SELECT count(*)::int AS n FROM supplier_price WHERE supplier_id = $1`, [
      supplier.id,
    ])) as { n: number }[];
    expect(count[0]?.n).toBe(ROWS);
  });
});
