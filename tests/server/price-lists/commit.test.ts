import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COIL_SPEC_FIELDS, FIELD_LABELS, PLUG_SPEC_FIELDS } from '../../../shared/price-list/fields';
import type { CommitPriceListResponse, PriceList, PriceListHistory } from '../../../shared/schemas/price-lists';
import type { Supplier } from '../../../shared/schemas/suppliers';
import type { SearchResponse } from '../../../shared/schemas/search';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { caughtMail } from '../../helpers/mail';
import { newSupplier, post, stage, upload, type Signed } from '../../helpers/price-list-api';
import { csv, runTag, STANDARD_HEADER, type Cell } from '../../helpers/price-list-files';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

/** A whole plug spec, as a supplier's data sheet gives it; heat code 6 is in Quaywell's table (seed/data/brands.ts: 4–12). */
const PLUG_SPEC: Record<(typeof PLUG_SPEC_FIELDS)[number], string> = {
  threadMm: '14',
  threadPitchMm: '1.25',
  reachMm: '19',
  seat: 'flat',
  hexMm: '16',
  gapMm: '0.8',
  regappable: 'yes',
  resistor: 'yes',
  resistorKohm: '5',
  projectedTip: 'no',
  electrode: 'iridium',
  heatCode: '6',
};
/** A whole coil spec in the trade's units (Ω, kΩ, mH, kV, A). */
const COIL_SPEC: Record<(typeof COIL_SPEC_FIELDS)[number], string> = {
  architecture: 'coil-on-plug',
  driver: 'integrated',
  outputs: '1',
  connectorPins: '3',
  connectorKey: 'A',
  primaryOhmMin: '0.5',
  primaryOhmMax: '0.8',
  primaryInductanceMh: '2.5',
  secondaryKohmMin: '6',
  secondaryKohmMax: '9',
  turnsRatio: '80',
  availableKv: '35',
  peakCurrentA: '7.5',
};
const SPEC_FIELDS = [...COIL_SPEC_FIELDS, ...PLUG_SPEC_FIELDS];
// The spec columns under the labels the mapping screen shows, which the guess knows.
const HEADER = [...STANDARD_HEADER, ...SPEC_FIELDS.map((f) => FIELD_LABELS[f])];
const SPECS: Record<'coil' | 'plug', Record<string, string>> = { coil: COIL_SPEC, plug: PLUG_SPEC };
const specCells = (spec: 'coil' | 'plug' | undefined): Cell[] => SPEC_FIELDS.map((f) => (spec ? SPECS[spec][f] : undefined) ?? null);

function line(
  number: string,
  brand: string,
  cost: string,
  list: string,
  kind: string,
  opts: { supersedes?: string; spec?: 'coil' | 'plug'; pack?: number } = {},
): Cell[] {
  return [
    number,
    brand,
    `${kind} ${number}`,
    cost,
    list,
    '0.00',
    opts.pack ?? 1,
    null,
    opts.supersedes ?? null,
    kind,
    ...specCells(opts.spec),
  ];
}

async function mailAbout(subjectPart: string, timeoutMs = 5000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = (await caughtMail()).find((m) => m.subject.includes(subjectPart));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`no mail about ${subjectPart}`);
}

interface PriceRow {
  part_number: string;
  cost_cents: number;
  list_cents: number;
  core_cents: number;
  pack_qty: number;
  price_list_id: string | null;
}

describe('commit and discard', () => {
  let t: TestApp;
  let buyer: Signed;
  let buyerEmail: string;

  beforeAll(async () => {
    t = await createTestApp();
    const u = await makeUser(t.deps.dataSource, 'buyer');
    buyerEmail = u.email;
    buyer = await signIn(t.app, u.email, TEST_PASSWORD);
  });
  afterAll(() => t.close());

  async function prices(supplierId: string): Promise<PriceRow[]> {
    return (await t.deps.dataSource.query(
      `SELECT p.part_number, sp.cost_cents, sp.list_cents, sp.core_cents, sp.pack_qty, sp.price_list_id
         FROM supplier_price sp JOIN part p ON p.id = sp.part_id WHERE sp.supplier_id = $1 ORDER BY p.part_number`,
      [supplierId],
    )) as PriceRow[];
  }

  it('commits all valid rows in one go: new parts (with a spec when given), prices, supersession, history, audit, search, e-mail', async () => {
    const tag = runTag();
    const supplier = await newSupplier(buyer, 'Commit');
    const disabled = await makeUser(t.deps.dataSource, 'buyer', { disabled: true });
    const file = csv([
      HEADER,
      line('QW-IC 3140', 'Quaywell', '26.00', '53.00', 'coil'),
      line('QW-SP 1406', 'Quaywell', '3.30', '7.59', 'plug', { pack: 4 }),
      line('NR/IR 2208', 'Norrow', '7.00', '15.99', 'plug', { pack: 4 }),
      line(`QW-SP T${tag}1`, 'Quaywell', '4.10', '9.99', 'plug', { spec: 'plug', pack: 4 }),
      line(`QW-IC T${tag}2`, 'Quaywell', '20.00', '41.00', 'coil'),
      line(`QW-IC T${tag}4`, 'Quaywell', '22.00', '45.00', 'coil', { spec: 'coil' }),
      line(`QW-IC T${tag}3`, 'Quaywell', '21.00', '43.00', 'coil', { supersedes: `QW-IC T${tag}2` }),
    ]);
    const staged = await stage(buyer, { supplierId: supplier.id, file, fileName: 'harbor.csv' });
    expect(staged.counts).toEqual({ total: 7, new: 4, changed: 3, unchanged: 0, rejected: 0, firstPrices: 3, supersessions: 1 });
    expect(await prices(supplier.id)).toEqual([]);

    const res = await post(buyer, `/api/price-lists/${staged.id}/commit`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const committed = res.body as CommitPriceListResponse;
    expect(committed).toMatchObject({ status: 'committed', counts: staged.counts, notices: [] });
    expect(committed.applied).toEqual({ partsCreated: 4, specsStored: 2, pricesWritten: 7, supersessionsLinked: 1 });
    expect(committed.committedBy?.id).toEqual(staged.createdBy?.id);
    expect(committed.committedAt).toEqual(expect.any(String));

    expect((await prices(supplier.id)).map((p) => [p.part_number, p.cost_cents, p.list_cents, p.pack_qty, p.price_list_id])).toEqual([
      ['NR/IR 2208', 700, 1599, 4, staged.id],
      ['QW-IC 3140', 2600, 5300, 1, staged.id],
      [`QW-IC T${tag}2`, 2000, 4100, 1, staged.id],
      [`QW-IC T${tag}3`, 2100, 4300, 1, staged.id],
      [`QW-IC T${tag}4`, 2200, 4500, 1, staged.id],
      ['QW-SP 1406', 330, 759, 4, staged.id],
      [`QW-SP T${tag}1`, 410, 999, 4, staged.id],
    ]);
    const ds = t.deps.dataSource;
    const parts = (await ds.query(
      `SELECT p.part_number, p.kind, s.part_number AS superseded_by, ps.heat_code, ps.reach_mm, cs.primary_ohm_max AS coil_ohm_max
         FROM part p LEFT JOIN part s ON s.id = p.superseded_by_id LEFT JOIN plug_spec ps ON ps.part_id = p.id
         LEFT JOIN coil_spec cs ON cs.part_id = p.id WHERE p.part_number LIKE $1 ORDER BY p.part_number`,
      [`%T${tag}%`],
    )) as {
      part_number: string;
      kind: string;
      superseded_by: string | null;
      heat_code: string | null;
      reach_mm: number | null;
      coil_ohm_max: number | null;
    }[];
    expect(parts).toEqual([
      { part_number: `QW-IC T${tag}2`, kind: 'coil', superseded_by: `QW-IC T${tag}3`, heat_code: null, reach_mm: null, coil_ohm_max: null },
      { part_number: `QW-IC T${tag}3`, kind: 'coil', superseded_by: null, heat_code: null, reach_mm: null, coil_ohm_max: null },
      { part_number: `QW-IC T${tag}4`, kind: 'coil', superseded_by: null, heat_code: null, reach_mm: null, coil_ohm_max: 0.8 },
      { part_number: `QW-SP T${tag}1`, kind: 'plug', superseded_by: null, heat_code: '6', reach_mm: 19, coil_ohm_max: null },
    ]);
    const audits = (await ds.query(`SELECT action, actor_id, data FROM audit_log WHERE entity_id = $1`, [staged.id])) as {
      action: string;
      actor_id: string;
      data: { sha256: string };
    }[];
    expect(audits).toEqual([
      { action: 'price-list.commit', actor_id: staged.createdBy?.id, data: expect.objectContaining({ sha256: staged.sha256 }) },
    ]);

    // The supplier remembers the mapping and shows the date of its last list.
    const suppliers = ((await buyer.agent.get('/api/suppliers').expect(200)).body as { suppliers: Supplier[] }).suppliers;
    const mine = suppliers.find((s) => s.id === supplier.id);
    expect(mine?.mapping).toEqual(staged.mapping);
    expect(mine?.lastPriceListAt).toBe(committed.committedAt);

    // The Counter finds the new part, and the superseded number leads to its successor.
    const found = (
      await buyer.agent
        .get('/api/search')
        .query({ q: `QW-SP T${tag}1` })
        .expect(200)
    ).body as SearchResponse;
    expect(found.hits[0]?.partNumber).toBe(`QW-SP T${tag}1`);
    const successor = (
      await buyer.agent
        .get('/api/search')
        .query({ q: `QW-IC T${tag}2` })
        .expect(200)
    ).body as SearchResponse;
    expect(successor.hits[0]?.partNumber).toBe(`QW-IC T${tag}3`);

    // The summary reaches the buyers through the SMTP catcher, not a disabled one.
    const mail = await mailAbout(supplier.name);
    expect(mail.to).toContain(buyerEmail);
    expect(mail.to).not.toContain(disabled.email);
    expect(mail.subject).toBe(`Price list committed: ${supplier.name} — 4 new, 3 changed, 0 flagged`);
    expect(mail.text).toContain('harbor.csv');
    expect(mail.text).toContain(staged.sha256);
  });

  it('remembers the confirmed mapping for the supplier’s next file', async () => {
    const supplier = await newSupplier(buyer, 'Memory');
    const header = ['Artikel', 'Hersteller', 'EK', 'VK', 'Art'];
    const mapping = { Artikel: 'partNumber', Hersteller: 'brand', EK: 'cost', VK: 'list', Art: 'kind' } as const;
    const first = csv([header, ['QW-IC 3140', 'Quaywell', '25,90', '52,99', 'coil']]);
    // Without a mapping the guess finds nothing it needs.
    expect((await upload(buyer, { supplierId: supplier.id, file: first })).status).toBe(400);
    const staged = await stage(buyer, { supplierId: supplier.id, file: first, mapping });
    expect((await post(buyer, `/api/price-lists/${staged.id}/commit`)).status).toBe(200);
    const next = await stage(buyer, { supplierId: supplier.id, file: csv([header, ['QW-IC 3140', 'Quaywell', '26,90', '52,99', 'coil']]) });
    expect(next.mappingSource).toBe('remembered');
    expect(next.mapping).toEqual(mapping);
    expect(next.counts).toMatchObject({ changed: 1, firstPrices: 0 });
  });

  it('discard leaves the catalog and the prices untouched', async () => {
    const tag = runTag();
    const supplier = await newSupplier(buyer, 'Discard');
    const base = await stage(buyer, {
      supplierId: supplier.id,
      file: csv([HEADER, line('QW-IC 3140', 'Quaywell', '26.00', '53.00', 'coil')]),
    });
    expect((await post(buyer, `/api/price-lists/${base.id}/commit`)).status).toBe(200);
    const before = await prices(supplier.id);

    const other = await stage(buyer, {
      supplierId: supplier.id,
      file: csv([
        HEADER,
        line('QW-IC 3140', 'Quaywell', '99.00', '199.00', 'coil'),
        line(`QW-IC D${tag}`, 'Quaywell', '5.00', '9.00', 'coil'),
      ]),
    });
    expect(other.counts).toMatchObject({ new: 1, changed: 1 });
    const res = await post(buyer, `/api/price-lists/${other.id}/discard`);
    expect(res.status).toBe(200);
    expect((res.body as PriceList).status).toBe('discarded');

    expect(await prices(supplier.id)).toEqual(before);
    const created = (await t.deps.dataSource.query(`SELECT 1 FROM part WHERE part_number = $1`, [`QW-IC D${tag}`])) as unknown[];
    expect(created).toHaveLength(0);
    expect((await post(buyer, `/api/price-lists/${other.id}/commit`)).status).toBe(409);
    expect((await post(buyer, `/api/price-lists/${other.id}/discard`)).status).toBe(409);
    expect((await post(buyer, `/api/price-lists/${base.id}/discard`)).status).toBe(409);
  });

  it('refuses the same file twice for one supplier, at commit and at upload, with a clear message', async () => {
    const supplier = await newSupplier(buyer, 'Twice');
    const file = csv([HEADER, line('QW-IC 3140', 'Quaywell', '26.00', '53.00', 'coil')]);
    const first = await stage(buyer, { supplierId: supplier.id, file });
    const second = await stage(buyer, { supplierId: supplier.id, file });
    expect(second.sha256).toBe(first.sha256);
    expect((await post(buyer, `/api/price-lists/${first.id}/commit`)).status).toBe(200);
    const again = await post(buyer, `/api/price-lists/${second.id}/commit`);
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/same file was committed/);
    const third = await upload(buyer, { supplierId: supplier.id, file });
    expect(third.status).toBe(409);
    expect(third.body.error.message).toMatch(/same file .* was committed for this supplier/);
    expect(third.body.error.details.priceListId).toBe(first.id);
    // Another supplier may send the very same bytes.
    const elsewhere = await newSupplier(buyer, 'Elsewhere');
    expect((await upload(buyer, { supplierId: elsewhere.id, file })).status).toBe(201);
  });

  it('marks the supplier’s other staged lists stale; they commit only once previewed again', async () => {
    const supplier = await newSupplier(buyer, 'Stale');
    const one = await stage(buyer, {
      supplierId: supplier.id,
      file: csv([
        HEADER,
        line('QW-IC 3140', 'Quaywell', '26.00', '53.00', 'coil'),
        line('QW-IC 3150', 'Quaywell', '30.00', '60.00', 'coil'),
      ]),
    });
    const two = await stage(buyer, {
      supplierId: supplier.id,
      file: csv([
        HEADER,
        line('QW-IC 3140', 'Quaywell', '26.00', '53.00', 'coil'),
        line('QW-IC 3150', 'Quaywell', '31.00', '60.00', 'coil'),
      ]),
    });
    expect(two.counts).toMatchObject({ changed: 2, firstPrices: 2, unchanged: 0 });
    expect((await post(buyer, `/api/price-lists/${one.id}/commit`)).status).toBe(200);

    const stale = (await buyer.agent.get(`/api/price-lists/${two.id}`).expect(200)).body as PriceList;
    expect(stale).toMatchObject({ status: 'staged', stale: true });
    const refused = await post(buyer, `/api/price-lists/${two.id}/commit`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/preview it again/);

    const previewed = await post(buyer, `/api/price-lists/${two.id}/preview`);
    expect(previewed.status).toBe(200);
    // Against list one's prices now: 3140 is the same, 3150 moved 30.00 → 31.00.
    expect(previewed.body).toMatchObject({ stale: false, counts: { changed: 1, unchanged: 1, firstPrices: 0 } });
    expect((await post(buyer, `/api/price-lists/${two.id}/commit`)).status).toBe(200);
    expect((await prices(supplier.id)).map((p) => [p.part_number, p.cost_cents, p.price_list_id])).toEqual([
      ['QW-IC 3140', 2600, two.id],
      ['QW-IC 3150', 3100, two.id],
    ]);

    const history = (await buyer.agent.get('/api/price-lists').query({ supplierId: supplier.id }).expect(200)).body as PriceListHistory;
    expect(history.total).toBe(2);
    expect(history.priceLists.map((l) => [l.id, l.status, l.stale])).toEqual([
      [two.id, 'committed', false],
      [one.id, 'committed', false],
    ]);
    for (const l of history.priceLists) {
      expect(l).toMatchObject({
        fileName: 'prices.csv',
        createdBy: { id: expect.any(String), name: expect.any(String) },
        committedAt: expect.any(String),
      });
      expect(l.sha256).toMatch(/^[0-9a-f]{64}$/);
      expect(l.mapping).toMatchObject({ 'Part Number': 'partNumber' });
    }
  });
});
