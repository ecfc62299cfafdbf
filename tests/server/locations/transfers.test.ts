import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Location, Transfer } from '../../../shared/schemas/locations';
import type { PartDetail } from '../../../shared/schemas/parts';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { caughtMail, waitForMail } from '../../helpers/mail';
import { createTestApp, signIn, type Agent, type TestApp } from '../../helpers/test-app';

type Signed = { agent: Agent; token: string; email: string };

describe('stores, stock per store and transfers', () => {
  let t: TestApp;
  let admin: Signed;
  let north: Location;
  let south: Location;
  let northClerk: Signed;
  let southClerk: Signed;
  let partId: string;

  const as = async (role: 'clerk' | 'admin', homeLocationId?: string): Promise<Signed> => {
    const u = await makeUser(t.deps.dataSource, role, homeLocationId ? { homeLocationId } : {});
    return { ...(await signIn(t.app, u.email, TEST_PASSWORD)), email: u.email };
  };
  const onHand = async (locationId: string): Promise<number | null> => {
    const rows = (await t.deps.dataSource.query(`SELECT on_hand FROM stock WHERE location_id = $1 AND part_id = $2`, [
      locationId,
      partId,
    ])) as {
      on_hand: number;
    }[];
    return rows[0]?.on_hand ?? null;
  };
  const request = async (qty: number): Promise<Transfer> => {
    const res = await southClerk.agent
      .post('/api/transfers')
      .set('x-csrf-token', southClerk.token)
      .send({ partId, fromLocationId: north.id, quantity: qty });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return res.body.transfer as Transfer;
  };
  const step = (who: Signed, id: string, body: object) =>
    who.agent.post(`/api/transfers/${id}/steps`).set('x-csrf-token', who.token).send(body);

  beforeAll(async () => {
    t = await createTestApp();
    admin = await as('admin');
    const tag = randomUUID().slice(0, 6);
    const make = async (name: string): Promise<Location> => {
      const res = await admin.agent
        .post('/api/locations')
        .set('x-csrf-token', admin.token)
        .send({ name: `${name} ${tag}`, address: '1 Test Row', phone: '555-0100', openingHours: 'Mon–Fri 8–17' });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      return res.body.location as Location;
    };
    north = await make('North');
    south = await make('South');
    northClerk = await as('clerk', north.id);
    southClerk = await as('clerk', south.id);
    // A seeded part of ours (demo data), stocked at North only.
    const [part] = (await t.deps.dataSource.query(`SELECT id FROM part WHERE part_number = 'QW-IC 3101'`)) as { id: string }[];
    partId = part!.id;
    await t.deps.dataSource.query(`INSERT INTO stock (location_id, part_id, on_hand, bin) VALUES ($1, $2, 5, 'N-01-1')`, [
      north.id,
      partId,
    ]);
  });
  afterAll(() => t.close());

  it('lists the stores, the new ones included', async () => {
    const res = await southClerk.agent.get('/api/locations').expect(200);
    const names = (res.body.locations as Location[]).map((l) => l.name);
    expect(names).toEqual(expect.arrayContaining([north.name, south.name]));
    expect(res.body.locations.find((l: Location) => l.id === north.id)).toMatchObject({ address: '1 Test Row', phone: '555-0100' });
  });

  it('shows each clerk their own store first and the other stores after', async () => {
    const atSouth = (await southClerk.agent.get(`/api/parts/${partId}`).expect(200)).body as PartDetail;
    expect(atSouth.stock).toMatchObject({ inStock: true, here: { locationId: south.id, onHand: 0, bin: '' } });
    expect('elsewhere' in atSouth.stock && atSouth.stock.elsewhere).toContainEqual({ locationId: north.id, name: north.name, onHand: 5 });

    const atNorth = (await northClerk.agent.get(`/api/parts/${partId}`).expect(200)).body as PartDetail;
    expect(atNorth.stock).toMatchObject({ here: { locationId: north.id, onHand: 5, bin: 'N-01-1' } });
    expect('elsewhere' in atNorth.stock && atNorth.stock.elsewhere.some((e) => e.locationId === north.id)).toBe(false);
  });

  it('walks a transfer through its steps, moves the stock on receipt, audits and mails every step', async () => {
    const tr = await request(2);
    expect(tr).toMatchObject({ state: 'requested', from: { id: north.id }, to: { id: south.id }, quantity: 2 });
    // The requesting store may not pick its own request; the source store may.
    expect((await step(southClerk, tr.id, { step: 'pick' })).status).toBe(403);
    for (const [who, s, state] of [
      [northClerk, 'pick', 'picked'],
      [northClerk, 'send', 'sent'],
      [southClerk, 'receive', 'received'],
    ] as const) {
      const res = await step(who, tr.id, { step: s });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      expect(res.body.transfer.state).toBe(state);
    }
    expect(await onHand(north.id)).toBe(3);
    expect(await onHand(south.id)).toBe(2);

    const audit = (await t.deps.dataSource.query(
      `SELECT action FROM audit_log WHERE entity_type = 'transfer' AND entity_id = $1 ORDER BY id`,
      [tr.id],
    )) as { action: string }[];
    expect(audit.map((a) => a.action)).toEqual(['transfer.request', 'transfer.pick', 'transfer.send', 'transfer.receive']);
    const history = (await t.deps.dataSource.query(
      `SELECT location_id, delta, on_hand_after, reason FROM stock_change WHERE transfer_id = $1 ORDER BY id`,
      [tr.id],
    )) as { location_id: string; delta: number; on_hand_after: number }[];
    expect(history).toEqual([
      { location_id: north.id, delta: -2, on_hand_after: 3, reason: 'transfer' },
      { location_id: south.id, delta: 2, on_hand_after: 2, reason: 'transfer' },
    ]);
    // The requester's mail names the part and the step; delivery through the job queue is asynchronous.
    await waitForMail(southClerk.email);
    await vi.waitFor(
      async () => {
        const subjects = (await caughtMail()).filter((m) => m.to.includes(southClerk.email)).map((m) => m.subject);
        expect(subjects).toEqual(
          expect.arrayContaining([
            'Transfer picked: Quaywell QW-IC 3101',
            'Transfer sent: Quaywell QW-IC 3101',
            'Transfer received: Quaywell QW-IC 3101',
          ]),
        );
      },
      { timeout: 10_000, interval: 100 },
    );
  });

  it('two stores acting on one transfer at once: one wins, the other gets a 409, nothing is lost', async () => {
    const tr = await request(1);
    const [pick, cancel] = await Promise.all([step(northClerk, tr.id, { step: 'pick' }), step(southClerk, tr.id, { step: 'cancel' })]);
    expect([pick.status, cancel.status].sort()).toEqual([200, 409]);
    const loser = pick.status === 409 ? pick : cancel;
    expect(loser.body).toEqual({ error: { code: 'conflict', message: expect.any(String), details: expect.anything() } });
    const audited = (await t.deps.dataSource.query(`SELECT count(*)::int AS n FROM audit_log WHERE entity_id = $1`, [tr.id])) as {
      n: number;
    }[];
    expect(audited[0]!.n).toBe(2);
  });

  it('never takes the source below zero: receiving more than it holds is refused and changes nothing', async () => {
    const before = await onHand(north.id);
    const tr = await request(before! + 1);
    await step(northClerk, tr.id, { step: 'pick' }).expect(200);
    await step(northClerk, tr.id, { step: 'send' }).expect(200);
    const res = await step(southClerk, tr.id, { step: 'receive' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
    expect(await onHand(north.id)).toBe(before);
    const state = (await t.deps.dataSource.query(`SELECT state FROM transfer WHERE id = $1`, [tr.id])) as { state: string }[];
    expect(state[0]!.state).toBe('sent');
  });

  it('a refusal needs a reason and tells the requester', async () => {
    const tr = await request(1);
    expect((await step(northClerk, tr.id, { step: 'refuse' })).status).toBe(400);
    const res = await step(northClerk, tr.id, { step: 'refuse', reason: 'Last one is reserved' });
    expect(res.status).toBe(200);
    expect(res.body.transfer).toMatchObject({ state: 'refused', refusalReason: 'Last one is reserved', steps: [] });
  });
});
