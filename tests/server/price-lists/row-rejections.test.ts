import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PriceList, PriceListChanges, PriceListErrors } from '../../../shared/schemas/price-lists';
import type { Supplier } from '../../../shared/schemas/suppliers';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { newSupplier, stage, type Signed } from '../../helpers/price-list-api';
import { csv, runTag, STANDARD_HEADER, type Cell } from '../../helpers/price-list-files';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

const HEADER = [...STANDARD_HEADER, 'Gap mm'];
const coil = (number: string, over: Partial<Record<'cost' | 'list' | 'gtin' | 'kind' | 'description' | 'brand', string>> = {}): Cell[] => [
  number,
  over.brand ?? 'Quaywell',
  over.description ?? 'Ignition coil',
  over.cost ?? '25.90',
  over.list ?? '52.99',
  '0.00',
  1,
  over.gtin ?? null,
  null,
  over.kind ?? 'coil',
  null,
];
const plug = (number: string, gap: string, brand = 'Quaywell'): Cell[] => [
  number,
  brand,
  'Spark plug',
  '3.25',
  '7.49',
  '0.00',
  4,
  null,
  null,
  'plug',
  gap,
];

describe('lines rejected one by one while the others go on', () => {
  let t: TestApp;
  let buyer: Signed;
  let supplier: Supplier;
  let list: PriceList;
  const tag = runTag();
  const longDescription = 'x'.repeat(10_001);

  beforeAll(async () => {
    t = await createTestApp();
    buyer = await signIn(t.app, (await makeUser(t.deps.dataSource, 'buyer')).email, TEST_PASSWORD);
    supplier = await newSupplier(buyer, 'Rejections');
    const file = csv([
      HEADER,
      coil('QW-IC 3140'), // 2: valid, in the catalog
      coil('QW-IC 3150', { cost: 'abc' }), // 3
      coil('QW-IC 3160', { list: '-5.00' }), // 4
      coil('QW-IC 3170', { gtin: '2091450031705' }), // 5: the right check digit is 4 (seed/csv/README.md lists 2091450031704)
      coil('QW-IC 3180', { kind: 'lead set' }), // 6
      plug('QW-SP 1411', '9'), // 7: a gap of 9 mm, the plug schema allows at most 3
      plug('QW-SP 1406', '0.8'), // 8: same part as line 10
      coil('QW-IC 3181', { description: longDescription }), // 9
      plug('qw-sp1406', '0.8'), // 10: same part as line 8 once normalised
      plug('NR/IR 2208', '0.7', 'Norrow'), // 11: valid
      coil(`FW-${tag}`, { brand: 'Fernwick' }), // 12: a brand the catalog does not have
      coil(`QW-IC N${tag}`, { kind: '' }), // 13: a new number with no kind
      coil(`QW-IC K${tag}`), // 14: valid, new
    ]);
    list = await stage(buyer, { supplierId: supplier.id, file });
  });
  afterAll(() => t.close());

  it('counts every line once: 3 valid, 10 rejected', () => {
    expect(list.counts).toEqual({ total: 13, new: 1, changed: 2, unchanged: 0, rejected: 10, firstPrices: 2, supersessions: 0 });
  });

  it('gives line, column and reason for each rejected line', async () => {
    const res = await buyer.agent.get(`/api/price-lists/${list.id}/errors`).query({ limit: 100 }).expect(200);
    const { errors, total } = res.body as PriceListErrors;
    expect(total).toBe(10);
    const got = errors.map((e) => [e.line, e.column, e.message]);
    expect(got).toEqual([
      [3, 'Cost', expect.stringMatching(/"abc" is not an amount/)],
      [4, 'List', expect.stringMatching(/"-5.00" is negative/)],
      [5, 'GTIN', expect.stringMatching(/wrong check digit \(expected 4\)/)],
      [6, 'Kind', expect.stringMatching(/unknown kind "lead set"/)],
      [7, 'Gap mm', expect.stringMatching(/"9" is out of range: at most 3/)],
      [8, 'Part Number', expect.stringMatching(/also on line 10; both lines are rejected/)],
      [9, 'Description', expect.stringMatching(/longer than 10,000 characters \(10,001\)/)],
      [10, 'Part Number', expect.stringMatching(/also on line 8; both lines are rejected/)],
      [12, 'Brand', expect.stringMatching(/unknown brand "Fernwick"/)],
      [13, 'Kind', expect.stringMatching(/new number and the file does not say whether it is a coil or a plug/)],
    ]);
  });

  it('stages the valid lines beside them', async () => {
    const res = await buyer.agent.get(`/api/price-lists/${list.id}/changes`).expect(200);
    const { changes } = res.body as PriceListChanges;
    expect(changes.map((c) => [c.line, c.partNumber, c.type])).toEqual([
      [2, 'QW-IC 3140', 'changed'],
      [11, 'NR/IR 2208', 'changed'],
      [14, `QW-IC K${tag}`, 'new'],
    ]);
    // A first price from this supplier: nothing to compare with.
    expect(changes[0]).toMatchObject({ oldCostCents: null, newCostCents: 2590, costChangePct: null, flagged: false });
  });

  it('exports the rejected lines as CSV with their cells', async () => {
    const res = await buyer.agent.get(`/api/price-lists/${list.id}/errors.csv`).expect(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const rows = parse(res.text, { bom: true }) as string[][];
    expect(rows[0]).toEqual(['Line', 'Column', 'Reason', ...HEADER]);
    expect(rows.slice(1).map((r) => r[0])).toEqual(['3', '4', '5', '6', '7', '8', '9', '10', '12', '13']);
    expect(rows.find((r) => r[0] === '3')?.slice(3, 7)).toEqual(['QW-IC 3150', 'Quaywell', 'Ignition coil', 'abc']);
    // Lines rejected after staging (duplicate, unknown brand) carry the values as read.
    expect(rows.find((r) => r[0] === '8')?.slice(3, 5)).toEqual(['QW-SP 1406', 'Quaywell']);
    expect(rows.find((r) => r[0] === '12')?.slice(3, 5)).toEqual([`FW-${tag}`, 'Fernwick']);
  });
});

describe('formula injection', () => {
  let t: TestApp;
  let buyer: Signed;

  beforeAll(async () => {
    t = await createTestApp();
    buyer = await signIn(t.app, (await makeUser(t.deps.dataSource, 'buyer')).email, TEST_PASSWORD);
  });
  afterAll(() => t.close());

  it('defuses a description that starts like a formula, rejects such a part number with a reason, and escapes every export', async () => {
    const supplier = await newSupplier(buyer, 'Formulas');
    const tag = runTag();
    const formula = '=HYPERLINK("http://x","y")';
    const badCosts = ['+1+2', '-2+3', '@SUM(A1:A2)'];
    const file = csv([
      ['Part Number', 'Brand', 'Description', 'Cost', 'List', 'Kind', 'Supersedes'],
      [`FX-${tag}-1`, 'Quaywell', formula, '33.80', '68.99', 'coil', null], // 2: kept, defused
      [formula, 'Quaywell', 'Ignition coil', '33.80', '68.99', 'coil', null], // 3: rejected
      [`FX-${tag}-2`, '+Quaywell', 'Ignition coil', '33.80', '68.99', 'coil', null], // 4: rejected
      [`FX-${tag}-3`, 'Quaywell', 'Ignition coil', '33.80', '68.99', 'coil', '=A1'], // 5: rejected
      ...badCosts.map((c, i) => [`FX-${tag}-${4 + i}`, 'Quaywell', formula, c, '52.99', 'coil', null]), // 6-8: not amounts
    ]);
    const list = await stage(buyer, { supplierId: supplier.id, file });
    expect(list.counts).toMatchObject({ total: 7, new: 1, rejected: 6 });

    // The preview shows the description with its apostrophe (the page marks it); the commit stores that.
    const changes = (await buyer.agent.get(`/api/price-lists/${list.id}/changes`).expect(200)).body as PriceListChanges;
    expect(changes.changes.map((c) => [c.partNumber, c.description])).toEqual([[`FX-${tag}-1`, `'${formula}`]]);

    const errors = (await buyer.agent.get(`/api/price-lists/${list.id}/errors`).expect(200)).body as PriceListErrors;
    const reason = (line: number) => errors.errors.filter((e) => e.line === line).map((e) => `${e.column}: ${e.message}`);
    expect(reason(3)).toEqual([
      `Part Number: ${JSON.stringify(formula)} starts with “=”, as a spreadsheet formula does; a part number never does`,
    ]);
    expect(reason(4)).toEqual(['Brand: "+Quaywell" starts with “+”, as a spreadsheet formula does; a brand name never does']);
    expect(reason(5)).toEqual(['Supersedes: "=A1" starts with “=”, as a spreadsheet formula does; a part number never does']);
    expect(reason(6)).toEqual(['Cost: "+1+2" is not an amount']);

    // Rejected lines keep their cells as they came; the download escapes each formula cell.
    const res = await buyer.agent.get(`/api/price-lists/${list.id}/errors.csv`).expect(200);
    const rows = parse(res.text, { bom: true }) as string[][];
    const line3 = rows.find((r) => r[0] === '3')!;
    expect(line3.slice(3, 4)).toEqual([`'${formula}`]);
    // A leading apostrophe makes a spreadsheet show the text (OWASP "CSV injection"; common practice).
    for (const row of rows) for (const cell of row) expect(cell).not.toMatch(/^[=+\-@]/);
  });
});
