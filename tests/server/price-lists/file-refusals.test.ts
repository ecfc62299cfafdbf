import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PriceListHistory } from '../../../shared/schemas/price-lists';
import type { Supplier } from '../../../shared/schemas/suppliers';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { newSupplier, upload, type Signed } from '../../helpers/price-list-api';
import { csv, gtin, STANDARD_HEADER } from '../../helpers/price-list-files';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

const ROW = ['QW-IC 3140', 'Quaywell', 'Ignition coil', '25.90', '52.99', '0.00', 1, gtin('209145003140'), null, 'coil'];

describe('files refused as a whole', () => {
  let t: TestApp;
  let buyer: Signed;
  let supplier: Supplier;

  beforeAll(async () => {
    t = await createTestApp();
    buyer = await signIn(t.app, (await makeUser(t.deps.dataSource, 'buyer')).email, TEST_PASSWORD);
    supplier = await newSupplier(buyer, 'Refusals');
  });
  afterAll(() => t.close());

  /** A refusal leaves nothing behind: the supplier's history stays empty. */
  async function expectNoTrace(): Promise<void> {
    const res = await buyer.agent.get('/api/price-lists').query({ supplierId: supplier.id }).expect(200);
    expect((res.body as PriceListHistory).total).toBe(0);
  }

  const cases: { name: string; file: () => Buffer; status: number; code: string; reason: string; message: RegExp }[] = [
    { name: 'an empty file', file: () => Buffer.alloc(0), status: 400, code: 'bad_request', reason: 'empty', message: /empty/ },
    {
      name: 'a binary file (a ZIP, as an .xlsx is)',
      file: () => Buffer.concat([Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00]), Buffer.alloc(300, 7)]),
      status: 415,
      code: 'unsupported_file',
      reason: 'binary',
      message: /not a text CSV file.*Excel/,
    },
    {
      name: 'a binary file (NUL bytes)',
      file: () => Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, 0x49, 0x48, 0x44, 0x52]),
      status: 415,
      code: 'unsupported_file',
      reason: 'binary',
      message: /not a text CSV file/,
    },
    {
      name: 'a header with no rows',
      file: () => Buffer.from(csv([STANDARD_HEADER])),
      status: 400,
      code: 'bad_request',
      reason: 'header-only',
      message: /header but no rows/,
    },
    {
      name: 'a missing required column (no cost)',
      file: () =>
        Buffer.from(
          csv([
            ['Part Number', 'Brand', 'List'],
            ['QW-IC 3140', 'Quaywell', '52.99'],
          ]),
        ),
      status: 400,
      code: 'bad_request',
      reason: 'missing-column',
      message: /[Cc]ost/,
    },
    {
      name: 'a column named twice',
      file: () =>
        Buffer.from(
          csv([
            [...STANDARD_HEADER, 'Cost'],
            [...ROW, '1.00'],
          ]),
        ),
      status: 400,
      code: 'bad_request',
      reason: 'duplicate-header',
      message: /twice: Cost/,
    },
  ];

  for (const c of cases) {
    it(`refuses ${c.name} with ${c.status} and a clear message`, async () => {
      const res = await upload(buyer, { supplierId: supplier.id, file: c.file() });
      expect(res.status, JSON.stringify(res.body)).toBe(c.status);
      expect(res.body.error.code).toBe(c.code);
      expect(res.body.error.details.reason).toBe(c.reason);
      expect(res.body.error.message).toMatch(c.message);
      await expectNoTrace();
    });
  }

  it('names the headers and the mapping tried when a required column is missing, for the mapping screen', async () => {
    const res = await upload(buyer, {
      supplierId: supplier.id,
      file: csv([
        ['Artikel', 'Hersteller', 'EK', 'VK'],
        ['QW-IC 3140', 'Quaywell', '25.90', '52.99'],
      ]),
    });
    expect(res.status).toBe(400);
    expect(res.body.error.details.headers).toEqual(['Artikel', 'Hersteller', 'EK', 'VK']);
    const missing = (res.body.error.details.problems as { code: string; field?: string }[]).filter((p) => p.code === 'missing-required');
    expect(missing.map((p) => p.field).sort()).toEqual(['brand', 'cost', 'list', 'partNumber']);
  });

  it('refuses a mapping naming a column the file does not have', async () => {
    const res = await upload(buyer, {
      supplierId: supplier.id,
      file: csv([STANDARD_HEADER, ROW]),
      mapping: { 'Part Number': 'partNumber', Brand: 'brand', Cost: 'cost', List: 'list', 'No Such Column': 'gtin' },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.details.reason).toBe('invalid-mapping');
    expect(res.body.error.message).toContain('No Such Column');
  });

  it('refuses a file over the 50 MB limit of Settings with 413', async () => {
    // Default maxFileMb is 50 (shared/schemas/settings.ts); one byte over it.
    const line = Buffer.from(`${csv([ROW])}`);
    const size = 50 * 1024 * 1024 + 1;
    const big = Buffer.alloc(size);
    const header = Buffer.from(csv([STANDARD_HEADER]));
    header.copy(big, 0);
    for (let at = header.length; at < size; at += line.length) line.copy(big, at, 0, Math.min(line.length, size - at));
    const res = await upload(buyer, { supplierId: supplier.id, file: big });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
    expect(res.body.error.details).toMatchObject({ reason: 'too-large', limitMb: 50 });
    expect(res.body.error.message).toMatch(/larger than the limit of 50 MB/);
    await expectNoTrace();
  });

  it('refuses an upload without a file, for an unknown supplier, and with a mapping that is not JSON', async () => {
    const noFile = await buyer.agent.post('/api/price-lists').set('x-csrf-token', buyer.token).field('supplierId', supplier.id);
    expect(noFile.status).toBe(400);
    expect(noFile.body.error.message).toMatch(/^file:/);
    const unknown = await upload(buyer, { supplierId: randomUUID(), file: csv([STANDARD_HEADER, ROW]) });
    expect(unknown.status).toBe(404);
    const badJson = await buyer.agent
      .post('/api/price-lists')
      .set('x-csrf-token', buyer.token)
      .field('supplierId', supplier.id)
      .field('mapping', '{not json')
      .attach('file', Buffer.from(csv([STANDARD_HEADER, ROW])), 'x.csv');
    expect(badJson.status).toBe(400);
    expect(JSON.stringify(badJson.body.error.details)).toContain('mapping');
    await expectNoTrace();
  });
});
