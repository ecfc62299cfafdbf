import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PriceList, PriceListErrors } from '../../../shared/schemas/price-lists';
import type { Supplier } from '../../../shared/schemas/suppliers';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { newSupplier, post, upload, type Signed } from '../../helpers/price-list-api';
import { isFullyCommitted, listState } from '../../helpers/price-list-checks';
import { baseFiles, mutatedFile } from '../../helpers/price-list-corpus';
import { runTag, seededRandom } from '../../helpers/price-list-files';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

const FILES = 520;
const SEED = 20261201;
/** Bad input gets a 4xx; a 409 is the same bytes as a file already committed. */
const ANSWERS = [201, 400, 409, 413, 415];

describe('a corpus of damaged files', () => {
  let t: TestApp;
  let buyer: Signed;
  let supplier: Supplier;

  beforeAll(async () => {
    t = await createTestApp();
    buyer = await signIn(t.app, (await makeUser(t.deps.dataSource, 'buyer')).email, TEST_PASSWORD);
    supplier = await newSupplier(buyer, 'Corpus');
  });
  afterAll(() => t.close());

  it(`answers ${FILES} mutated files without a 500, and commits the staged ones whole`, async () => {
    const random = seededRandom(SEED);
    const bases = baseFiles(runTag());
    const statuses = new Map<number, number>();
    let committed = 0;
    for (let i = 0; i < FILES; i++) {
      const { file, how } = mutatedFile(random, bases);
      const res = await upload(buyer, { supplierId: supplier.id, file, fileName: `corpus-${i}.csv` });
      const what = `file ${i} (seed ${SEED}, ${how.join(' + ')}): ${res.status} ${JSON.stringify(res.body).slice(0, 300)}`;
      expect(ANSWERS, what).toContain(res.status);
      statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
      if (res.status !== 201) {
        expect(res.body.error.message, what).toEqual(expect.any(String));
        continue;
      }
      const list = res.body as PriceList;
      const c = list.counts;
      expect(c, what).not.toBeNull();
      if (!c) continue;
      expect(c.new + c.changed + c.unchanged + c.rejected, what).toBe(c.total);
      const errors = (await buyer.agent.get(`/api/price-lists/${list.id}/errors`).query({ limit: 1 }).expect(200)).body as PriceListErrors;
      expect(errors.total, what).toBeGreaterThanOrEqual(c.rejected);

      if (i % 6 === 0) {
        const commit = await post(buyer, `/api/price-lists/${list.id}/commit`);
        expect(commit.status, `${what} → commit ${JSON.stringify(commit.body)}`).toBe(200);
        const state = await listState(t.deps.dataSource, list.id);
        expect(isFullyCommitted(state), `${what} → ${JSON.stringify(state)}`).toBe(true);
        expect(state.pricesFromList, what).toBe(c.new + c.changed + c.unchanged);
        committed++;
      }
    }
    console.log(`corpus: ${FILES} files, answers ${JSON.stringify(Object.fromEntries(statuses))}, ${committed} committed`);
    // The corpus reaches both sides: files staged (and committed) and files refused.
    expect(committed).toBeGreaterThan(10);
    expect((statuses.get(400) ?? 0) + (statuses.get(415) ?? 0)).toBeGreaterThan(50);
  }, 240_000);
});
