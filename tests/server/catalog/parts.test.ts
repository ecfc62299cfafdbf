import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { gtinCheckDigit } from '../../../shared/gtin';
import type { SearchResponse } from '../../../shared/schemas/search';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, signIn, type Agent, type TestApp } from '../../helpers/test-app';

const PLUG = {
  threadMm: 14,
  threadPitchMm: 1.25,
  reachMm: 19,
  seat: 'flat',
  hexMm: 16,
  gapMm: 0.9,
  regappable: true,
  resistor: true,
  resistorKohm: 5,
  projectedTip: true,
  electrode: 'iridium',
};

describe('parts, engines and vehicles', () => {
  let t: TestApp;
  const agents: Record<string, { agent: Agent; token: string }> = {};
  let partId = '';

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of ['clerk', 'technician', 'buyer', 'admin'] as const) {
      const u = await makeUser(t.deps.dataSource, role);
      agents[role] = await signIn(t.app, u.email, TEST_PASSWORD);
    }
    const r = await agents.clerk!.agent.get('/api/search').query({ q: 'QW-IC 3140' });
    partId = (r.body as SearchResponse).hits[0]!.partId;
  });
  afterAll(() => t.close());

  it('a clerk sees sell price, stock and bin but no cost or margin field at all', async () => {
    const res = await agents.clerk!.agent.get(`/api/parts/${partId}`).expect(200);
    expect(res.body.stock).toMatchObject({
      inStock: expect.any(Boolean),
      here: { locationId: expect.any(String), bin: expect.any(String), onHand: expect.any(Number) },
      elsewhere: expect.any(Array),
    });
    expect(res.body.prices.length).toBeGreaterThan(0);
    expect(res.body.prices[0].listCents).toBeGreaterThan(0);
    const json = JSON.stringify(res.body);
    expect(json).not.toContain('costCents');
    expect(json).not.toContain('marginPct');
  });

  it('a technician sees list price and in stock yes/no, without cost, count or bin', async () => {
    const res = await agents.technician!.agent.get(`/api/parts/${partId}`).expect(200);
    expect(Object.keys(res.body.stock as object)).toEqual(['inStock']);
    const json = JSON.stringify(res.body);
    expect(json).not.toContain('costCents');
    expect(json).not.toContain('"bin"');
    expect(res.body.prices[0].listCents).toBeGreaterThan(0);
  });

  it('a buyer sees cost and margin, and the margin is (list − cost) / list', async () => {
    const res = await agents.buyer!.agent.get(`/api/parts/${partId}`).expect(200);
    for (const p of res.body.prices as { costCents: number; listCents: number; marginPct: number }[]) {
      expect(p.costCents).toBeGreaterThan(0);
      expect(p.marginPct).toBeCloseTo(((p.listCents - p.costCents) / p.listCents) * 100, 1);
    }
  });

  it('shows the supersession chain from any part in it', async () => {
    const r = await agents.clerk!.agent.get('/api/search').query({ q: 'QW-IC 3139' });
    expect((r.body as SearchResponse).hits[0]?.partNumber).toBe('QW-IC 3140');
    const detail = await agents.clerk!.agent.get(`/api/parts/${partId}`).expect(200);
    expect(detail.body.supersession.current.partNumber).toBe('QW-IC 3140');
    expect((detail.body.supersession.supersedes as { partNumber: string }[]).map((p) => p.partNumber)).toEqual([
      'QW-IC 3139',
      'QW-IC 3138',
    ]);
  });

  it('walks the vehicle picker: years → makes → models → engines → fitted coil and plug', async () => {
    const a = agents.clerk!.agent;
    const years = (await a.get('/api/vehicles/years').expect(200)).body.years as number[];
    expect(years).toContain(2012);
    const makes = (await a.get('/api/vehicles/makes').query({ year: 2012 }).expect(200)).body.makes as string[];
    expect(makes).toContain('Varrick');
    const models = (await a.get('/api/vehicles/models').query({ year: 2012, make: 'Varrick' }).expect(200)).body.models as string[];
    expect(models).toContain('Halvard');
    const engines = (await a.get('/api/vehicles/engines').query({ year: 2012, make: 'Varrick', model: 'Halvard' }).expect(200)).body
      .engines as {
      id: string;
      code: string;
      label: string;
    }[];
    const vk18 = engines.find((e) => e.code === 'VK18');
    expect(vk18?.label).toContain('VK18');
    const detail = await a.get(`/api/engines/${vk18!.id}`).expect(200);
    expect(detail.body.engine.code).toBe('VK18');
    const fitted = (
      detail.body.fitments as { part: { partNumber: string }; position: string; quantity: number; price: { listCents: number } }[]
    ).map((f) => [f.position, f.part.partNumber, f.quantity]);
    expect(fitted).toEqual(
      expect.arrayContaining([
        ['ignition coil', 'QW-IC 3101', 4],
        ['spark plug', 'QW-SP 1406', 4],
      ]),
    );
    expect(JSON.stringify(detail.body)).not.toContain('costCents');
  });

  it('a missing vehicle query parameter is a 400 naming it', async () => {
    const res = await agents.clerk!.agent.get('/api/vehicles/models').query({ year: 2012 });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error.details)).toContain('make');
  });

  it('heat codes of two brands running in opposite directions map to the right heat steps', async () => {
    const { agent, token } = agents.buyer!;
    const tag = randomUUID().slice(0, 6);
    // Invented brands: one numbers colder plugs higher, the other numbers hotter plugs higher.
    const up = `Ascend ${tag}`;
    const down = `Descend ${tag}`;
    await agent
      .post('/api/brands')
      .set('x-csrf-token', token)
      .send({ name: up, ours: true, heatCodes: [5, 6, 7, 8].map((c) => ({ code: String(c), heatStep: c })) })
      .expect(201);
    await agent
      .post('/api/brands')
      .set('x-csrf-token', token)
      .send({ name: down, ours: true, heatCodes: [5, 6, 7, 8].map((c) => ({ code: String(c), heatStep: 13 - c })) })
      .expect(201);
    const make = async (brand: string, heatCode: string) => {
      const res = await agent
        .post('/api/parts')
        .set('x-csrf-token', token)
        .send({ brand, partNumber: `HX-${heatCode}-${tag}`, kind: 'plug', description: 'heat test plug', plug: { ...PLUG, heatCode } });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      return res.body.spec.heatStep as number;
    };
    expect(await make(up, '8')).toBe(8);
    expect(await make(down, '8')).toBe(5);
    expect(await make(down, '5')).toBe(8);
    // A code the brand's table does not have is refused.
    const bad = await agent
      .post('/api/parts')
      .set('x-csrf-token', token)
      .send({ brand: up, partNumber: `HX-9-${tag}`, kind: 'plug', plug: { ...PLUG, heatCode: '9' } });
    expect(bad.status).toBe(400);
  });

  it('catalog edits reach search: a new part, a new interchange number, a supersession', async () => {
    const { agent, token } = agents.buyer!;
    const tag = String(Math.floor(Math.random() * 1e6)).padStart(6, '0');
    const body12 = `20${tag}9912`.slice(0, 12);
    const gtin = `${body12}${gtinCheckDigit(body12)}`;
    const created = await agent
      .post('/api/parts')
      .set('x-csrf-token', token)
      .send({
        brand: 'Quaywell',
        partNumber: `QW-SP 9${tag}`,
        kind: 'plug',
        description: 'Edit-reaches-search plug',
        gtin,
        plug: { ...PLUG, heatCode: '8' },
      });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const newId = created.body.part.id as string;
    const find = async (q: string) => ((await agent.get('/api/search').query({ q }).expect(200)).body as SearchResponse).hits;
    expect((await find(`QW SP 9${tag}`))[0]?.partId).toBe(newId);

    await agent
      .post('/api/interchange')
      .set('x-csrf-token', token)
      .send({ brand: 'Invented OE', number: `IOE-77-${tag}`, partId: newId, source: 'manual' })
      .expect(201);
    expect((await find(`IOE77${tag}`)).map((h) => h.partId)).toContain(newId);

    const successor = await agent
      .post('/api/parts')
      .set('x-csrf-token', token)
      .send({
        brand: 'Quaywell',
        partNumber: `QW-SP 8${tag}`,
        kind: 'plug',
        description: 'Its successor',
        plug: { ...PLUG, heatCode: '8' },
      })
      .expect(201);
    await agent.patch(`/api/parts/${newId}`).set('x-csrf-token', token).send({ supersededById: successor.body.part.id }).expect(200);
    const hits = await find(`QW-SP 9${tag}`);
    expect(hits[0]).toMatchObject({ partId: successor.body.part.id, matchedBy: 'supersession' });
    // A loop is refused.
    const loop = await agent.patch(`/api/parts/${successor.body.part.id}`).set('x-csrf-token', token).send({ supersededById: newId });
    expect(loop.status).toBe(400);
    const log = (await t.deps.dataSource.query(`SELECT action FROM audit_log WHERE entity_id = $1 ORDER BY id`, [newId])) as {
      action: string;
    }[];
    expect(log.map((l) => l.action)).toEqual(['part.create', 'part.update']);
  });

  it('refuses a GTIN with a wrong check digit, and a clerk may not edit the catalog', async () => {
    const { agent, token } = agents.buyer!;
    const res = await agent
      .post('/api/parts')
      .set('x-csrf-token', token)
      .send({ brand: 'Quaywell', partNumber: 'QW-BAD 1', kind: 'coil', gtin: '6291041500214' });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error.details)).toContain('gtin');
    const clerk = agents.clerk!;
    await clerk.agent
      .post('/api/parts')
      .set('x-csrf-token', clerk.token)
      .send({ brand: 'Quaywell', partNumber: 'QW-NO 1', kind: 'coil' })
      .expect(403);
  });
});
