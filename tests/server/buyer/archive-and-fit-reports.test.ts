import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FitReport, FitReportsResponse, SharedFitReportResponse } from '../../../shared/schemas/fit-reports';
import type { PartDetail } from '../../../shared/schemas/parts';
import type { PriceListHistory } from '../../../shared/schemas/price-lists';
import { DEFAULT_STORE_SETTINGS } from '../../../shared/schemas/settings';
import type { SuppliersResponse } from '../../../shared/schemas/suppliers';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { newSupplier, post, stage, type Signed } from '../../helpers/price-list-api';
import { csv, runTag, STANDARD_HEADER } from '../../helpers/price-list-files';
import { createTestApp, signIn, type TestApp } from '../../helpers/test-app';
import { engineIdOf, partIdOf } from '../compat/helpers';

describe('archiving, and what a fit report carries', () => {
  let t: TestApp;
  let buyer: Signed;
  let clerk: Signed;
  let clerkName: string;

  beforeAll(async () => {
    t = await createTestApp();
    buyer = await signIn(t.app, (await makeUser(t.deps.dataSource, 'buyer')).email, TEST_PASSWORD);
    const c = await makeUser(t.deps.dataSource, 'clerk');
    clerkName = c.name;
    clerk = await signIn(t.app, c.email, TEST_PASSWORD);
  });
  afterAll(() => t.close());

  it('an archived supplier leaves the lists but keeps its price lists in the history', async () => {
    const supplier = await newSupplier(buyer, 'Archive');
    const tag = runTag();
    const staged = await stage(buyer, {
      supplierId: supplier.id,
      file: csv([STANDARD_HEADER, [`QW-IC A${tag}`, 'Quaywell', 'Coil', '20.00', '40.00', '0.00', 1, null, null, 'coil']]),
    });
    expect((await post(buyer, `/api/price-lists/${staged.id}/commit`)).status).toBe(200);

    const archived = await buyer.agent.patch(`/api/suppliers/${supplier.id}`).set('x-csrf-token', buyer.token).send({ archived: true });
    expect(archived.status, JSON.stringify(archived.body)).toBe(200);
    expect(archived.body.supplier.archivedAt).not.toBeNull();

    const active = (await buyer.agent.get('/api/suppliers').expect(200)).body as SuppliersResponse;
    expect(active.suppliers.map((s) => s.id)).not.toContain(supplier.id);
    const all = (await buyer.agent.get('/api/suppliers?archived=include').expect(200)).body as SuppliersResponse;
    expect(all.suppliers.find((s) => s.id === supplier.id)?.archivedAt).not.toBeNull();
    const history = (await buyer.agent.get(`/api/price-lists?supplierId=${supplier.id}`).expect(200)).body as PriceListHistory;
    expect(history.priceLists.map((l) => l.id)).toEqual([staged.id]);

    // Its prices are no longer sold at: the part it alone priced has no sell price.
    const part = await partIdOf(t.deps.dataSource, `QW-IC A${tag}`);
    expect(((await clerk.agent.get(`/api/parts/${part}`).expect(200)).body as PartDetail).price).toBeNull();

    await buyer.agent.patch(`/api/suppliers/${supplier.id}`).set('x-csrf-token', buyer.token).send({ archived: false }).expect(200);
    expect(((await buyer.agent.get('/api/suppliers').expect(200)).body as SuppliersResponse).suppliers.map((s) => s.id)).toContain(
      supplier.id,
    );
    expect(((await clerk.agent.get(`/api/parts/${part}`).expect(200)).body as PartDetail).price?.listCents).toBe(4000);
  });

  it('a fit report carries the vehicle, the store and the prices; its public page has no staff name; the list finds and archives it', async () => {
    const ds = t.deps.dataSource;
    const tag = runTag();
    const vehicle = { year: 2014, make: `Make${tag}`, model: 'Estrel', engine: 'VK16 1.6 I4' };
    const inputs = {
      original: { partId: await partIdOf(ds, 'QW-IC 3101') },
      substitute: { partId: await partIdOf(ds, 'QW-IC 3104') },
      engine: { engineId: await engineIdOf(ds, 'VK16') },
    };
    const res = await clerk.agent
      .post('/api/fit-reports')
      .set('x-csrf-token', clerk.token)
      .send({ kind: 'coil', notes: `Customer waiting, ticket ${tag}`, vehicle, inputs });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const report = res.body.fitReport as FitReport;
    expect(report.vehicle).toEqual(vehicle);
    expect(report.createdBy).toBe(clerkName);

    // The prices are the sell prices the part detail shows (the same rule).
    const sub = (await clerk.agent.get(`/api/parts/${inputs.substitute.partId}`).expect(200)).body as PartDetail;
    expect(report.prices.find((p) => p.side === 'substitute')?.listCents).toBe(sub.price?.listCents);

    const token = report.shareUrl.split('/').pop()!;
    const shared = await request(t.app).get(`/api/shared/fit-reports/${token}`).expect(200);
    const body = shared.body as SharedFitReportResponse;
    expect(JSON.stringify(shared.body)).not.toContain(clerkName);
    expect('createdBy' in body.fitReport).toBe(false);
    expect(body.fitReport.store.name).toBe(DEFAULT_STORE_SETTINGS.name);
    expect(body.fitReport.store.phone).toBe(DEFAULT_STORE_SETTINGS.phone);
    expect(body.fitReport.prices.length).toBeGreaterThan(0);
    expect(body.fitReport.prices.every((p) => p.listCents > 0)).toBe(true);

    const find = async (q: string, archived = 'exclude') =>
      ((await clerk.agent.get('/api/fit-reports').query({ q, archived }).expect(200)).body as FitReportsResponse).fitReports.map(
        (r) => r.id,
      );
    expect(await find(`make${tag.toLowerCase()} estrel`)).toEqual([report.id]);
    expect(await find(`ticket ${tag}`)).toEqual([report.id]);
    expect(await find(`QW-IC 3104 ${tag}`)).toEqual([report.id]);
    expect(await find(`make${tag} nothing-like-this`)).toEqual([]);

    await clerk.agent.patch(`/api/fit-reports/${report.id}`).set('x-csrf-token', clerk.token).send({ archived: true }).expect(200);
    expect(await find(tag)).toEqual([]);
    expect(await find(tag, 'include')).toEqual([report.id]);
    // The customer's link still opens it.
    await request(t.app).get(`/api/shared/fit-reports/${token}`).expect(200);

    // From the Counter's link the vehicle comes without the engine's name: the compared engine's label is kept.
    const picked = await clerk.agent
      .post('/api/fit-reports')
      .set('x-csrf-token', clerk.token)
      .send({ kind: 'coil', vehicle: { year: 2014, make: vehicle.make, model: 'Estrel' }, inputs });
    expect(picked.status, JSON.stringify(picked.body)).toBe(201);
    const pickedReport = picked.body.fitReport as FitReport;
    expect(pickedReport.vehicle?.engine).toBe(pickedReport.result.engine.label);
  });
});
