import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { CommitPriceListResponse } from '../../../shared/schemas/price-lists';
import { onlyJob, waitForJobState } from '../../helpers/jobs';
import { caughtMail } from '../../helpers/mail';
import { OwnSearchApp } from '../../helpers/own-search';
import { newSupplier, post, stage, type Signed } from '../../helpers/price-list-api';
import { csv, STANDARD_HEADER } from '../../helpers/price-list-files';
import type { TestApp } from '../../helpers/test-app';

describe('a price-list commit while the search service is down', () => {
  let own: OwnSearchApp;
  let t: TestApp;
  let buyer: Signed;

  beforeAll(async () => {
    own = await OwnSearchApp.start({ down: true });
    t = own.t;
    buyer = await own.signInAs('buyer');
  });
  afterAll(() => own.close());

  it('is done (200, committed, no notice), the buyers get the summary, and the index catches up when the service is back', async () => {
    const tag = randomBytes(3).toString('hex').toUpperCase();
    const supplier = await newSupplier(buyer, 'Search down');
    const number = `QW-IC D${tag}`;
    const staged = await stage(buyer, {
      supplierId: supplier.id,
      file: csv([STANDARD_HEADER, [number, 'Quaywell', 'Coil-on-plug coil, commit test', '20.00', '41.00', '0.00', 1, null, null, 'coil']]),
    });
    const res = await post(buyer, `/api/price-lists/${staged.id}/commit`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body as CommitPriceListResponse).toMatchObject({ status: 'committed', notices: [], applied: { partsCreated: 1 } });

    const [part] = (await t.deps.dataSource.query(`SELECT id FROM part WHERE part_number = $1`, [number])) as { id: string }[];
    const refresh = await onlyJob(t.deps.dataSource, 'search.refresh', { partIds: [part!.id] });
    await waitForJobState(t.deps.dataSource, refresh.id, ['retry']);

    // The summary e-mail does not wait for the search service: it went through its own job.
    const summary = await onlyJob(t.deps.dataSource, 'mail.send', { kind: 'price-list-summary', priceListId: staged.id });
    await waitForJobState(t.deps.dataSource, summary.id, ['completed']);
    const mail = await vi.waitFor(
      async () => {
        const found = (await caughtMail()).find((m) => m.subject.includes(supplier.name));
        if (!found) throw new Error('no summary yet');
        return found;
      },
      { timeout: 10_000, interval: 100 },
    );
    expect(mail.subject).toBe(`Price list committed: ${supplier.name} — 1 new, 0 changed, 0 flagged`);

    await own.restartSearch();
    await waitForJobState(t.deps.dataSource, refresh.id, ['completed']);
    expect((await t.deps.search.index.getDocument(part!.id)).partNumber).toBe(number);
  });
});
