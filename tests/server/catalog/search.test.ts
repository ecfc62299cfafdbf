import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SearchHit, SearchResponse } from '../../../shared/schemas/search';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, signIn, type Agent, type TestApp } from '../../helpers/test-app';

/** Searches run against the demo catalog, seeded and indexed by the global set-up. */
describe('GET /api/search', () => {
  let t: TestApp;
  let clerk: Agent;
  const search = async (params: Record<string, string>): Promise<SearchResponse> => {
    const res = await clerk.get('/api/search').query(params);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    return res.body as SearchResponse;
  };
  const numbers = (hits: SearchHit[]) => hits.map((h) => h.partNumber);

  beforeAll(async () => {
    t = await createTestApp();
    const u = await makeUser(t.deps.dataSource, 'clerk');
    clerk = (await signIn(t.app, u.email, TEST_PASSWORD)).agent;
  });
  afterAll(() => t.close());

  it('finds our part by its exact number, first', async () => {
    const r = await search({ q: 'QW-IC 3140' });
    expect(r.hits[0]).toMatchObject({ partNumber: 'QW-IC 3140', matchedBy: 'number', brand: 'Quaywell', kind: 'coil' });
  });

  it('finds it typed without dashes or spaces, in lower case, or with dots and slashes', async () => {
    for (const q of ['qwic3140', 'QW IC 3140', 'qw.ic/3140', 'Qw-Ic-3140']) {
      const r = await search({ q });
      expect(r.hits[0]?.partNumber, q).toBe('QW-IC 3140');
    }
  });

  it('tolerates one typo in a number (a wrong digit, a swapped pair)', async () => {
    const wrongDigit = await search({ q: 'QW-IC 3141' });
    expect(numbers(wrongDigit.hits)).toContain('QW-IC 3140');
    const swapped = await search({ q: 'QWCI3140' });
    expect(numbers(swapped.hits)).toContain('QW-IC 3140');
  });

  it("finds ours by another brand's number through interchange, and says so", async () => {
    const r = await search({ q: 'SPF 52.135' });
    const found = r.hits.filter((h) => h.matchedBy === 'interchange');
    // Two rows lead from this number: the right one and the demo's deliberately wrong one.
    expect(numbers(found).sort()).toEqual(['QW-SP 1406', 'QW-SP 1435']);
    expect(found.every((h) => h.matchedNumber === 'SPF52135')).toBe(true);
  });

  it('follows a superseded number along the chain to the current part', async () => {
    for (const old of ['QW-IC 3138', 'QW-IC 3139']) {
      const r = await search({ q: old });
      expect(r.hits[0], old).toMatchObject({ partNumber: 'QW-IC 3140', matchedBy: 'supersession' });
      // The superseded parts themselves are not offered.
      expect(numbers(r.hits)).not.toContain(old);
    }
  });

  it('finds an original-equipment number that points at a superseded part, at the current part', async () => {
    const r = await search({ q: 'TA 40-1138' });
    expect(numbers(r.hits)).toContain('QW-IC 3140');
  });

  it('finds a part by a scanned GTIN', async () => {
    const detail = await clerk.get(`/api/search`).query({ q: 'QW-SP 1435' });
    const id = (detail.body as SearchResponse).hits[0]!.partId;
    const part = await clerk.get(`/api/parts/${id}`).expect(200);
    const gtin = part.body.part.gtin as string;
    const r = await search({ q: gtin });
    expect(r.hits[0]).toMatchObject({ partNumber: 'QW-SP 1435', matchedBy: 'gtin' });
  });

  it('finds parts by vehicle words', async () => {
    const r = await search({ q: 'Halvard' });
    expect(r.hits.length).toBeGreaterThan(0);
    expect(r.hits.every((h) => h.matchedBy === 'vehicle')).toBe(true);
    // The Halvard's engines are fitted with QW-IC 3101 and QW-SP 1406 (demo data).
    expect(numbers(r.hits)).toEqual(expect.arrayContaining(['QW-IC 3101', 'QW-SP 1406']));
  });

  it('filters plugs by spec facets and reports facet counts when asked', async () => {
    const r = await search({ kind: 'plug', threadMm: '14', reachMm: '12.7', seat: 'flat', limit: '100', facets: 'true' });
    expect(r.hits.length).toBeGreaterThan(0);
    expect(r.hits.every((h) => h.kind === 'plug')).toBe(true);
    expect(numbers(r.hits)).toContain('QW-SP 1435');
    expect(numbers(r.hits)).not.toContain('QW-SP 1406');
    expect(r.facets.kind).toEqual({ plug: r.total });
    // Facet counts cost a pass over every match: a search that does not ask gets none.
    expect((await search({ kind: 'plug', threadMm: '14', limit: '5' })).facets).toEqual({});
  });

  it('filters coils by architecture, driver and a primary resistance inside the window', async () => {
    const r = await search({ kind: 'coil', driver: 'external', primaryOhm: '0.7', limit: '100' });
    expect(r.hits.length).toBeGreaterThan(0);
    for (const h of r.hits) {
      const p = await clerk.get(`/api/parts/${h.partId}`).expect(200);
      expect(p.body.spec.driver).toBe('external');
      expect(p.body.spec.primaryOhmMin).toBeLessThanOrEqual(0.7);
      expect(p.body.spec.primaryOhmMax).toBeGreaterThanOrEqual(0.7);
    }
  });

  it('free text finds by description words', async () => {
    const r = await search({ q: 'canister' });
    expect(r.hits.length).toBeGreaterThan(0);
    expect(r.hits.every((h) => /canister/i.test(h.description))).toBe(true);
  });

  it('gives the store its count and bin in every hit, the exact lookup and the index alike (seed/data/stock.ts)', async () => {
    const exact = await search({ q: 'QW-IC 3101' });
    expect(exact.hits[0]).toMatchObject({ partNumber: 'QW-IC 3101', inStock: true });
    expect(exact.hits[0]!.stock?.here).toMatchObject({ onHand: 14, bin: 'A-01-1' });
    const typo = await search({ q: 'QW-IC 3011' });
    expect(typo.hits.find((h) => h.partNumber === 'QW-IC 3101')?.stock?.here).toMatchObject({ onHand: 14, bin: 'A-01-1' });
  });

  it('gives a technician in stock yes/no only: no count, no bin', async () => {
    const tech = await makeUser(t.deps.dataSource, 'technician');
    const agent = (await signIn(t.app, tech.email, TEST_PASSWORD)).agent;
    const res = await agent.get('/api/search').query({ q: 'QW-IC 3101' });
    expect(res.status).toBe(200);
    const hit = (res.body as SearchResponse).hits[0]!;
    expect(hit.inStock).toBe(true);
    expect(hit).not.toHaveProperty('stock');
  });

  it('refuses a bad facet value with a 400 naming the field', async () => {
    const res = await clerk.get('/api/search').query({ seat: 'round' });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error.details)).toContain('seat');
  });
});
