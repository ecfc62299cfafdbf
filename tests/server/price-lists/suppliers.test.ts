import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Supplier } from '../../../shared/schemas/suppliers';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import type { Signed } from '../../helpers/price-list-api';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';

describe('suppliers', () => {
  let t: TestApp;
  let buyer: Signed;
  let admin: Signed;

  beforeAll(async () => {
    t = await createTestApp();
    buyer = await signIn(t.app, (await makeUser(t.deps.dataSource, 'buyer')).email, TEST_PASSWORD);
    admin = await signIn(t.app, (await makeUser(t.deps.dataSource, 'admin')).email, TEST_PASSWORD);
  });
  afterAll(() => t.close());

  it('lists the demo suppliers with their contact details (seed/data/suppliers.ts)', async () => {
    const res = await buyer.agent.get('/api/suppliers').expect(200);
    const suppliers = (res.body as { suppliers: Supplier[] }).suppliers;
    expect(suppliers.find((s) => s.key === 'pellworth')).toMatchObject({
      name: 'Pellworth Distribution',
      contactEmail: 'orders@pellworth.test',
      phone: '+1 555 0140',
    });
    expect(suppliers.find((s) => s.key === 'brackwater')?.name).toBe('Brackwater Trade Supply');
  });

  it('adds a supplier, deriving the key from the name when none is given', async () => {
    const tag = randomUUID().slice(0, 8);
    const res = await buyer.agent
      .post('/api/suppliers')
      .set('x-csrf-token', buyer.token)
      .send({ name: `Harbor Spark Supply ${tag}`, contactEmail: 'Prices@Harbor.test', phone: '+1 555 0199' });
    expect(res.status).toBe(201);
    const supplier = (res.body as { supplier: Supplier }).supplier;
    expect(supplier).toMatchObject({
      key: `harbor-spark-supply-${tag}`,
      name: `Harbor Spark Supply ${tag}`,
      contactEmail: 'prices@harbor.test',
      phone: '+1 555 0199',
      mapping: null,
      lastPriceListAt: null,
    });
    const listed = (await buyer.agent.get('/api/suppliers').expect(200)).body as { suppliers: Supplier[] };
    expect(listed.suppliers.map((s) => s.id)).toContain(supplier.id);
  });

  it('refuses a second supplier of the same name with a 409 that says so', async () => {
    const name = `Twin Supply ${randomUUID().slice(0, 8)}`;
    await buyer.agent.post('/api/suppliers').set('x-csrf-token', buyer.token).send({ name }).expect(201);
    const res = await buyer.agent
      .post('/api/suppliers')
      .set('x-csrf-token', buyer.token)
      .send({ name, key: `other-${randomUUID().slice(0, 8)}` });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/name or key exists/);
  });

  it('validates the body: a bad e-mail and a bad key are 400s naming the field', async () => {
    const bad = await buyer.agent.post('/api/suppliers').set('x-csrf-token', buyer.token).send({ name: 'X', contactEmail: 'not-an-email' });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.error.details)).toContain('contactEmail');
    const key = await buyer.agent.post('/api/suppliers').set('x-csrf-token', buyer.token).send({ name: 'X', key: 'Has Spaces' });
    expect(key.status).toBe(400);
    expect(JSON.stringify(key.body.error.details)).toContain('key');
  });

  it('edits a supplier (an admin may too), and 404s an unknown one', async () => {
    const created = await admin.agent
      .post('/api/suppliers')
      .set('x-csrf-token', admin.token)
      .send({ name: `Edit Me ${randomUUID().slice(0, 8)}` })
      .expect(201);
    const id = (created.body as { supplier: Supplier }).supplier.id;
    const res = await buyer.agent
      .patch(`/api/suppliers/${id}`)
      .set('x-csrf-token', buyer.token)
      .send({ phone: '+1 555 0111', contactEmail: null, mapping: { SKU: 'partNumber' } });
    expect(res.status).toBe(200);
    expect((res.body as { supplier: Supplier }).supplier).toMatchObject({
      phone: '+1 555 0111',
      contactEmail: null,
      mapping: { SKU: 'partNumber' },
    });
    const missing = await buyer.agent.patch(`/api/suppliers/${randomUUID()}`).set('x-csrf-token', buyer.token).send({ phone: '1' });
    expect(missing.status).toBe(404);
    const empty = await buyer.agent.patch(`/api/suppliers/${id}`).set('x-csrf-token', buyer.token).send({});
    expect(empty.status).toBe(400);
  });
});
