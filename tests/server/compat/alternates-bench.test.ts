import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, signIn, type Agent, type TestApp } from '../../helpers/test-app';
import { engineIdOf, partIdOf } from './helpers';

const ORDER = { go: 0, review: 1, 'no-go': 2 } as const;

describe('alternates and bench test', () => {
  let t: TestApp;
  let clerk: { agent: Agent; token: string };
  let tech: { agent: Agent; token: string };
  beforeAll(async () => {
    t = await createTestApp();
    clerk = await signIn(t.app, (await makeUser(t.deps.dataSource, 'clerk')).email, TEST_PASSWORD);
    tech = await signIn(t.app, (await makeUser(t.deps.dataSource, 'technician')).email, TEST_PASSWORD);
  });
  afterAll(() => t.close());

  it('ranks an engine\u2019s coil alternates by verdict, no-go only on request', async () => {
    const vk16 = await engineIdOf(t.deps.dataSource, 'VK16');
    const res = await clerk.agent.get(`/api/engines/${vk16}/alternates`).query({ kind: 'coil' }).expect(200);
    type Alt = { part: { partNumber: string }; verdict: keyof typeof ORDER; checks: { id: string }[] };
    const alts = res.body.alternates as Alt[];
    expect(res.body.original.partNumber).toBe('QW-IC 3101');
    expect(alts.length).toBeGreaterThan(0);
    expect(alts.some((a) => a.verdict === 'no-go')).toBe(false);
    const ranks = alts.map((a) => ORDER[a.verdict]);
    expect([...ranks].sort((a, b) => a - b)).toEqual(ranks);
    expect(alts.map((a) => a.part.partNumber)).toContain('QW-IC 3102');
    expect(alts.find((a) => a.part.partNumber === 'QW-IC 3104')?.verdict).toBe('review');
    expect(alts[0]!.checks.length).toBe(9);
    const all = await clerk.agent.get(`/api/engines/${vk16}/alternates`).query({ kind: 'coil', all: '1' }).expect(200);
    const everything = all.body.alternates as Alt[];
    expect(everything.find((a) => a.part.partNumber === 'QW-IC 3140')?.verdict).toBe('no-go');
    expect(everything.length).toBeGreaterThan(alts.length);
  });

  it('corrects a bench reading to 20 °C and judges it against the window (copper α = 0.00393 /K, IEC 60028, from memory)', async () => {
    const coil = await partIdOf(t.deps.dataSource, 'QW-IC 3101');
    const detail = await clerk.agent.get(`/api/parts/${coil}`).expect(200);
    const { primaryOhmMin, primaryOhmMax } = detail.body.spec as { primaryOhmMin: number; primaryOhmMax: number };
    const mid = (primaryOhmMin + primaryOhmMax) / 2;
    // A hot coil reads high: mid-window at 20 °C reads mid × (1 + α·40) at 60 °C.
    const hot = mid * (1 + 0.00393 * 40);
    const post = (measured: unknown) => tech.agent.post('/api/bench/coil').set('x-csrf-token', tech.token).send({ partId: coil, measured });
    const inSpec = await post({ primaryOhm: hot, temperatureC: 60 });
    expect(inSpec.status, JSON.stringify(inSpec.body)).toBe(200);
    expect(inSpec.body.verdict).toBe('in-spec');
    expect(inSpec.body.primaryAt20Ohm).toBeCloseTo(mid, 3);
    expect((await post({ primaryOhm: primaryOhmMax * 1.5, temperatureC: 20 })).body.verdict).toBe('out-of-spec');
    expect((await post({ primaryOhm: primaryOhmMin * 0.05, temperatureC: 20 })).body.verdict).toBe('short');
    expect((await post({ primaryOhm: null, temperatureC: 20 })).body.verdict).toBe('open');
    // Bench testing is the technician's: a clerk is refused.
    await clerk.agent
      .post('/api/bench/coil')
      .set('x-csrf-token', clerk.token)
      .send({ partId: coil, measured: { primaryOhm: hot, temperatureC: 60 } })
      .expect(403);
    const bad = await post({ primaryOhm: 0.5, temperatureC: 900 });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.error.details)).toContain('temperatureC');
  });
});
