import type { EntityManager } from 'typeorm';
import type { Role } from '../shared/roles';
import { ShopEntity, UserEntity } from '../server/entities';
import { hashPassword } from '../server/services/password';

/** The invented store's and shop's demo accounts; all share one demo password (README). */
export const DEMO_PASSWORD = 'arcwise-demo';
export const DEMO_SHOP = 'Dockside Garage';

export const DEMO_USERS: { email: string; name: string; role: Role; shop?: string }[] = [
  { email: 'admin@harborlane.test', name: 'Avery Admin', role: 'admin' },
  { email: 'buyer@harborlane.test', name: 'Blake Buyer', role: 'buyer' },
  { email: 'clerk@harborlane.test', name: 'Casey Clerk', role: 'clerk' },
  { email: 'tech@docksidegarage.test', name: 'Toni Tech', role: 'technician', shop: DEMO_SHOP },
];

/** Idempotent: existing accounts keep their passwords and roles. */
export async function seedUsers(m: EntityManager): Promise<number> {
  await m.createQueryBuilder().insert().into(ShopEntity).values({ name: DEMO_SHOP }).orIgnore().execute();
  const shop = await m.findOneByOrFail(ShopEntity, { name: DEMO_SHOP });
  const hash = await hashPassword(DEMO_PASSWORD);
  let created = 0;
  for (const u of DEMO_USERS) {
    if (await m.findOneBy(UserEntity, { email: u.email })) continue;
    await m.insert(UserEntity, { email: u.email, name: u.name, role: u.role, passwordHash: hash, shopId: u.shop ? shop.id : null });
    created++;
  }
  return created;
}
