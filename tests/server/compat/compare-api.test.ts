import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { compatResultSchema, type CompatResult } from '../../../shared/schemas/compat';
import type { SearchResponse } from '../../../shared/schemas/search';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, signIn, type Agent, type TestApp } from '../../helpers/test-app';
import { engineIdOf, partIdOf } from './helpers';

// Invented spec of a coil a technician measured, in the trade units of shared/schemas/specs.ts.
const TYPED_COIL = {
  architecture: 'coil-on-plug',
  driver: 'integrated',
  outputs: 1,
  connectorPins: 3,
  connectorKey: 'A',
  primaryOhmMin: 0.5,
  primaryOhmMax: 0.7,
  primaryInductanceMh: 3.5,
  turnsRatio: 90,
  availableKv: 38,
  peakCurrentA: 7.5,
};

describe('POST /api/compat/coil and /plug', () => {
  let t: TestApp;
  let tech: { agent: Agent; token: string };
  const ids: Record<string, string> = {};

  beforeAll(async () => {
    t = await createTestApp();
    const u = await makeUser(t.deps.dataSource, 'technician');
    tech = await signIn(t.app, u.email, TEST_PASSWORD);
    for (const n of [
      'QW-IC 3101',
      'QW-IC 3102',
      'QW-IC 3104',
      'QW-IC 3140',
      'QW-IC 3120',
      'QW-SP 1406',
      'QW-SP 1407',
      'QW-SP 1435',
      'SPF 52.135',
    ]) {
      ids[n] = await partIdOf(t.deps.dataSource, n);
    }
    for (const e of ['VK16', 'VK20T']) ids[e] = await engineIdOf(t.deps.dataSource, e);
  });
  afterAll(() => t.close());

  const post = (path: string, body: object) => tech.agent.post(path).set('x-csrf-token', tech.token).send(body);

  it('compares a demo coil with its alternates: go, review on energy, no-go on the connector (seed/data/alternates.ts)', async () => {
    const expectations: [string, CompatResult['verdict'], string | null][] = [
      ['QW-IC 3102', 'go', null],
      ['QW-IC 3104', 'review', 'energy-cranking'],
      ['QW-IC 3140', 'no-go', 'connector'],
    ];
    for (const [sub, verdict, deciding] of expectations) {
      const res = await post('/api/compat/coil', {
        original: { partId: ids['QW-IC 3101'] },
        substitute: { partId: ids[sub] },
        engine: { engineId: ids.VK16 },
      });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      const r = compatResultSchema.parse(res.body);
      expect(r.verdict, sub).toBe(verdict);
      if (deciding) expect(r.checks.find((c) => c.id === deciding)?.verdict).toBe(verdict);
      expect(r.checks.map((c) => c.id)).toEqual([
        'driver',
        'connector',
        'mounting',
        'primary-window',
        'driver-current',
        'energy-cranking',
        'voltage-reserve',
        'secondary-window',
        'turns-ratio',
      ]);
      expect(r.loadPoints.map((p) => p.name)).toEqual(['idle', 'cruise', 'full']);
      expect(r.currents?.original.length).toBeGreaterThan(10);
      expect(r.energyMj!.original).toBeGreaterThan(0);
      expect(r.cautions.join(' ')).toMatch(/tens of kilovolts/);
    }
  });

  it('adds the boost load point only for an engine with boost', async () => {
    const res = await post('/api/compat/coil', {
      original: { partId: ids['QW-IC 3120'] },
      substitute: { partId: ids['QW-IC 3120'] },
      engine: { engineId: ids.VK20T },
    });
    expect(res.status).toBe(200);
    expect((res.body as CompatResult).loadPoints.map((p) => p.name)).toEqual(['idle', 'cruise', 'full', 'boost']);
  });

  it("comparing a coil with itself is go on every row; a technician's typed spec works as either side", async () => {
    const res = await post('/api/compat/coil', {
      original: { spec: TYPED_COIL },
      substitute: { spec: TYPED_COIL },
      engine: { engineId: ids.VK16 },
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect((res.body as CompatResult).checks.every((c) => c.verdict === 'go')).toBe(true);
    expect((res.body as CompatResult).original.label).toMatch(/typed-in/);
  });

  it('compares plugs with the engine\u2019s fitted coil: one heat step colder is review, and says which way', async () => {
    const res = await post('/api/compat/plug', {
      original: { partId: ids['QW-SP 1406'] },
      substitute: { partId: ids['QW-SP 1407'] },
      engine: { engineId: ids.VK16 },
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const r = res.body as CompatResult;
    expect(r.verdict).toBe('review');
    const heat = r.checks.find((c) => c.id === 'heat')!;
    expect(heat.verdict).toBe('review');
    expect(heat.reason).toMatch(/colder/);
    expect(r.currents).toBeUndefined();
  });

  it("catches the demo's wrong interchange row: no-go, and the reason names the reach row", async () => {
    // seed/data/interchange.ts: SPF 52.135 (12.7 mm reach) was wrongly listed as QW-SP 1406 (19 mm).
    const detail = await tech.agent.get(`/api/parts/${ids['QW-SP 1406']}`).expect(200);
    const row = (
      detail.body.interchange as { number: string; check: { verdict: string; concerns: { id: string; reason: string }[] } | null }[]
    ).find((i) => i.number === 'SPF 52.135');
    expect(row?.check?.verdict).toBe('no-go');
    expect(row?.check?.concerns.map((c) => c.id)).toEqual(['reach']);
    expect(row?.check?.concerns[0]?.reason).toMatch(/12\.7/);
    // The same number's right row is go, at the counter's search too.
    const search = (await tech.agent.get('/api/search').query({ q: 'SPF 52.135' }).expect(200)).body as SearchResponse;
    const verdicts = Object.fromEntries(search.hits.map((h) => [h.partNumber, h.check?.verdict]));
    expect(verdicts).toEqual({ 'QW-SP 1435': 'go', 'QW-SP 1406': 'no-go' });
    // With the clerk's engine picked, the claim is judged on that engine.
    const km13 = await engineIdOf(t.deps.dataSource, 'KM13');
    const onKm13 = await tech.agent.get(`/api/parts/${ids['QW-SP 1406']}`).query({ engineId: km13 }).expect(200);
    const judged = (onKm13.body.interchange as { number: string; check: { verdict: string; engine: string } | null }[]).find(
      (i) => i.number === 'SPF 52.135',
    );
    expect(judged?.check).toMatchObject({ verdict: 'no-go', engine: expect.stringContaining('KM13') });
    // And directly: the foreign plug's own spec against ours.
    const direct = await post('/api/compat/plug', {
      original: { partId: ids['SPF 52.135'] },
      substitute: { partId: ids['QW-SP 1406'] },
      engine: { engineId: ids.VK16 },
    });
    expect(direct.body.verdict).toBe('no-go');
  });

  it('bad input is a 400 naming the field, never a verdict from nonsense', async () => {
    const cases: [object, string][] = [
      [
        {
          original: { spec: { ...TYPED_COIL, primaryOhmMin: 0.9, primaryOhmMax: 0.5 } },
          substitute: { partId: ids['QW-IC 3101'] },
          engine: { engineId: ids.VK16 },
        },
        'primaryOhmMin',
      ],
      [
        {
          original: { spec: { ...TYPED_COIL, primaryInductanceMh: -2 } },
          substitute: { partId: ids['QW-IC 3101'] },
          engine: { engineId: ids.VK16 },
        },
        'primaryInductanceMh',
      ],
      [
        {
          original: { partId: '00000000-0000-4000-8000-000000000001' },
          substitute: { partId: ids['QW-IC 3101'] },
          engine: { engineId: ids.VK16 },
        },
        'original.partId',
      ],
      [
        { original: { partId: ids['QW-SP 1406'] }, substitute: { partId: ids['QW-IC 3101'] }, engine: { engineId: ids.VK16 } },
        'original.partId',
      ],
      [
        {
          original: { partId: ids['QW-IC 3101'] },
          substitute: { partId: ids['QW-IC 3101'] },
          engine: { engineId: '00000000-0000-4000-8000-000000000002' },
        },
        'engine.engineId',
      ],
      [{ original: { partId: ids['QW-IC 3101'] }, substitute: { partId: ids['QW-IC 3101'] } }, 'engine'],
    ];
    for (const [body, field] of cases) {
      const res = await post('/api/compat/coil', body);
      expect(res.status, field).toBe(400);
      expect(res.body.verdict).toBeUndefined();
      expect(JSON.stringify(res.body.error.details), field).toContain(field);
    }
  });
});
