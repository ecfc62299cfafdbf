import type { EntityManager } from 'typeorm';
import type { Role } from '../shared/roles';
import { ShopEntity, UserEntity } from '../server/entities';
import { queryRows } from '../server/db/executor';
import { hashPassword } from '../server/services/password';
import { z } from 'zod';
import { EASTGATE, locations, QUAYSIDE } from './data/locations';

/** The invented store's and shop's demo accounts; all share one demo password (README). */
export const DEMO_PASSWORD = 'arcwise-demo';
export const DEMO_SHOP = 'Dockside Garage';

/** `home`: the store whose stock is "here" for them; a shop's technician has none. */
export const DEMO_USERS: { email: string; name: string; role: Role; shop?: string; home?: string }[] = [
  { email: 'admin@harborlane.test', name: 'Avery Admin', role: 'admin', home: QUAYSIDE },
  { email: 'buyer@harborlane.test', name: 'Blake Buyer', role: 'buyer', home: QUAYSIDE },
  { email: 'clerk@harborlane.test', name: 'Casey Clerk', role: 'clerk', home: QUAYSIDE },
  { email: 'clerk.eastgate@harborlane.test', name: 'Dana Clerk', role: 'clerk', home: EASTGATE },
  { email: 'tech@docksidegarage.test', name: 'Toni Tech', role: 'technician', shop: DEMO_SHOP },
];

const locationRow = z.object({ id: z.string(), name: z.string() });

/** The chain's three stores, inserted one by one so the first is the first opened. Idempotent. */
export async function seedLocations(m: EntityManager): Promise<Map<string, string>> {
  for (const l of locations) {
    await m.query(`INSERT INTO location (name, address, phone, opening_hours) VALUES ($1,$2,$3,$4) ON CONFLICT (name) DO NOTHING`, [
      l.name,
      l.address,
      l.phone,
      l.openingHours,
    ]);
  }
  return new Map((await queryRows(m, locationRow, `SELECT id, name FROM location`)).map((r) => [r.name, r.id]));
}

/** Idempotent: existing accounts keep their passwords, roles and home stores. */
export async function seedUsers(m: EntityManager): Promise<number> {
  const stores = await seedLocations(m);
  await m.createQueryBuilder().insert().into(ShopEntity).values({ name: DEMO_SHOP }).orIgnore().execute();
  const shop = await m.findOneByOrFail(ShopEntity, { name: DEMO_SHOP });
  const hash = await hashPassword(DEMO_PASSWORD);
  let created = 0;
  for (const u of DEMO_USERS) {
    if (await m.findOneBy(UserEntity, { email: u.email })) continue;
    await m.insert(UserEntity, {
      email: u.email,
      name: u.name,
      role: u.role,
      passwordHash: hash,
      shopId: u.shop ? shop.id : null,
      homeLocationId: u.home ? (stores.get(u.home) ?? null) : null,
    });
    created++;
  }
  return created;
}
