import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PriceList } from '../../../shared/schemas/price-lists';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { newSupplier, upload, type Signed } from '../../helpers/price-list-api';
import { bulkCsv, bulkRows, runTag } from '../../helpers/price-list-files';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

const ROWS = 60_000;

describe('progress of a large file', () => {
  let t: TestApp;
  let buyer: Signed;

  beforeAll(async () => {
    t = await createTestApp();
    buyer = await signIn(t.app, (await makeUser(t.deps.dataSource, 'buyer')).email, TEST_PASSWORD);
  });
  afterAll(() => t.close());

  it('shows rows done and bytes read while the upload is processed, and stays responsive', async () => {
    const supplier = await newSupplier(buyer, 'Progress');
    const file = Buffer.from(bulkCsv(bulkRows(runTag(), ROWS, 0)));
    const uploadId = randomUUID();
    let finished = false;
    const pending = upload(buyer, { supplierId: supplier.id, file, uploadId }).then((res) => {
      finished = true;
      return res;
    });
    const seen: { status: string; rowsDone: number; bytesRead: number }[] = [];
    while (!finished) {
      const res = await buyer.agent.get(`/api/price-lists/${uploadId}`);
      if (res.status === 200) {
        const list = res.body as PriceList;
        seen.push({
          status: list.status,
          rowsDone: list.progress.rowsDone,
          bytesRead: list.progress.bytesRead,
        });
      }
      await new Promise((r) => setTimeout(r, 20));
    }
    const done = await pending;
    expect(done.status).toBe(201);
    expect((done.body as PriceList).progress).toEqual({ phase: 'done', rowsDone: ROWS, bytesRead: file.length, bytesTotal: file.length });

    const midway = seen.filter((s) => s.status === 'processing' && s.rowsDone > 0 && s.rowsDone < ROWS);
    expect(midway.length, JSON.stringify(seen)).toBeGreaterThan(0);
    for (const s of midway) expect(s.bytesRead).toBeGreaterThan(0);
    // Rows done only grow.
    const rows = seen.map((s) => s.rowsDone);
    expect(rows).toEqual([...rows].sort((a, b) => a - b));
    // The API answers while the file is read: several answers came back at different points of the
    // same import, so no request waited for the whole of it.
    expect(new Set(midway.map((s) => s.rowsDone)).size, JSON.stringify(seen)).toBeGreaterThan(1);
  });
});
