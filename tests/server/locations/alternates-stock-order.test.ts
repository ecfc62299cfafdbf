import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AlternatesResponse } from '../../../shared/schemas/alternates';
import type { Location } from '../../../shared/schemas/locations';
import { normalizePartNumber } from '../../../shared/part-number';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { createTestApp, signIn, type Agent, type TestApp } from '../../helpers/test-app';
import { engineIdOf, partIdOf } from '../compat/helpers';

/**
 * Issue 11: "alternates sorted so that a part in stock here ranks above an equal verdict that is
 * not" — compat-model.md §7 (verdict, then deviation, then in stock, then price). Two invented
 * twins of one demo coil, with the same spec (so the same verdict and deviation) and no price,
 * are each on the shelf of one store only: each store's clerk sees their own store's twin first.
 */
describe('alternates: in stock here ranks above an equal alternate that is not', () => {
  let t: TestApp;
  const twins: { id: string; partNumber: string }[] = [];
  const stores: Location[] = [];
  const clerks: Agent[] = [];
  let vk16: string;

  beforeAll(async () => {
    t = await createTestApp();
    const ds = t.deps.dataSource;
    const admin = await signIn(t.app, (await makeUser(ds, 'admin')).email, TEST_PASSWORD);
    const tag = randomUUID().slice(0, 6);
    for (const name of ['Twin North', 'Twin South']) {
      const res = await admin.agent
        .post('/api/locations')
        .set('x-csrf-token', admin.token)
        .send({ name: `${name} ${tag}` })
        .expect(201);
      stores.push(res.body.location as Location);
    }
    // Seed: QW-IC 3102 is a go alternate for VK16's fitted QW-IC 3101 (seed/data/alternates.ts).
    const model = await partIdOf(ds, 'QW-IC 3102');
    for (const [i, store] of stores.entries()) {
      const partNumber = `ZT-TWIN ${tag}${i}`;
      const [row] = (await ds.query(
        `INSERT INTO part (brand_id, part_number, part_number_norm, kind, description)
           SELECT brand_id, $1, $2, kind, 'Invented twin for the ranking test' FROM part WHERE id = $3 RETURNING id`,
        [partNumber, normalizePartNumber(partNumber), model],
      )) as { id: string }[];
      await ds.query(
        `INSERT INTO coil_spec SELECT (jsonb_populate_record(NULL::coil_spec, to_jsonb(s) || jsonb_build_object('part_id', $1::uuid))).*
           FROM coil_spec s WHERE s.part_id = $2`,
        [row!.id, model],
      );
      await ds.query(`INSERT INTO stock (location_id, part_id, on_hand, bin) VALUES ($1, $2, 4, 'T-01-1')`, [store.id, row!.id]);
      twins.push({ id: row!.id, partNumber });
      const clerk = await makeUser(ds, 'clerk', { homeLocationId: store.id });
      clerks.push((await signIn(t.app, clerk.email, TEST_PASSWORD)).agent);
    }
    vk16 = await engineIdOf(ds, 'VK16');
  });
  afterAll(async () => {
    // The twins leave the shared test catalog as it was for the other files.
    const ids = twins.map((p) => p.id);
    await t.deps.dataSource.query(`DELETE FROM stock WHERE part_id = ANY($1::uuid[])`, [ids]);
    await t.deps.dataSource.query(`DELETE FROM part WHERE id = ANY($1::uuid[])`, [ids]);
    await t.close();
  });

  const ranked = async (clerk: Agent) =>
    ((await clerk.get(`/api/engines/${vk16}/alternates`).query({ kind: 'coil' }).expect(200)).body as AlternatesResponse).alternates;

  it('puts each store’s own twin first, the verdict and deviation being equal', async () => {
    for (const [i, clerk] of clerks.entries()) {
      const list = await ranked(clerk);
      const positions = twins.map((p) => list.findIndex((a) => a.part.id === p.id));
      expect(positions.every((p) => p >= 0)).toBe(true);
      const [a, b] = positions.map((p) => list[p]!);
      expect(a!.verdict).toBe(b!.verdict);
      expect(a!.deviation).toBe(b!.deviation);
      const mine = positions[i]!;
      const theirs = positions[1 - i]!;
      expect(mine, `store ${i}'s twin ranks first for its clerk`).toBeLessThan(theirs);
      expect(list[mine]!.stock).toMatchObject({ here: { locationId: stores[i]!.id, onHand: 4 } });
      expect(list[theirs]!.stock).toMatchObject({ here: { onHand: 0 } });
    }
  });
});
