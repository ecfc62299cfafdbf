import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ErrorBody } from '../../../shared/schemas/error';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, signIn, type Agent, type TestApp } from '../../helpers/test-app';

const UUID = '00000000-0000-4000-8000-000000000000';

describe('a refused request says which field and what is wrong, in plain words', () => {
  let t: TestApp;
  let admin: { agent: Agent; token: string };
  beforeAll(async () => {
    t = await createTestApp();
    const u = await makeUser(t.deps.dataSource, 'admin');
    admin = await signIn(t.app, u.email, TEST_PASSWORD);
  });
  afterAll(() => t.close());

  it('inside a union: the typed-in spec\'s electrode, not "substitute: Invalid input"', async () => {
    const spec = {
      threadMm: 14,
      threadPitchMm: 1.25,
      reachMm: 19,
      seat: 'flat',
      hexMm: 16,
      gapMm: 0.8,
      regappable: true,
      resistor: true,
      projectedTip: false,
      electrode: 'gold',
      heatStep: 6,
    };
    const res = await admin.agent
      .post('/api/compat/plug')
      .set('x-csrf-token', admin.token)
      .send({ original: { partId: UUID }, substitute: { spec }, engine: { engineId: UUID } })
      .expect(400);
    const { error } = res.body as ErrorBody;
    expect(error.code).toBe('validation_failed');
    expect(error.message).toBe('substitute.spec.electrode must be one of copper, platinum, iridium, fine-wire-platinum, fine-wire-iridium');
    expect(error.details).toEqual([
      { field: 'substitute.spec.electrode', message: 'must be one of copper, platinum, iridium, fine-wire-platinum, fine-wire-iridium' },
    ]);
  });

  it('a query parameter out of range, and a NUL in a name that used to answer 500', async () => {
    const makes = await admin.agent.get('/api/vehicles/makes').query({ year: 1800 }).expect(400);
    expect((makes.body as ErrorBody).error.message).toBe('year must be at least 1900');
    const invite = await admin.agent
      .post('/api/users/invite')
      .set('x-csrf-token', admin.token)
      .send({ email: 'robin@harborlane.test', name: 'Ro\u0000bin', role: 'clerk' })
      .expect(400);
    expect((invite.body as ErrorBody).error.details).toEqual([{ field: 'name', message: 'must not contain control characters' }]);
  });
});
