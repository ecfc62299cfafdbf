import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { Role } from '../../shared/roles';
import { ShopEntity, UserEntity } from '../../server/entities';
import { hashPassword } from '../../server/services/password';

export const TEST_PASSWORD = 'test-password-123';
let cachedHash: Promise<string> | null = null;

/** A fresh user of the given role with a unique e-mail; technicians get a fresh shop. */
export async function makeUser(
  ds: DataSource,
  role: Role,
  opts: { disabled?: boolean; shopId?: string; homeLocationId?: string } = {},
): Promise<UserEntity> {
  cachedHash ??= hashPassword(TEST_PASSWORD);
  const tag = randomUUID().slice(0, 8);
  let shopId = opts.shopId ?? null;
  if (role === 'technician' && !shopId) {
    shopId = (await ds.getRepository(ShopEntity).save({ name: `Test Shop ${tag}` })).id;
  }
  return ds.getRepository(UserEntity).save({
    email: `${role}-${tag}@example.test`,
    name: `Test ${role} ${tag}`,
    role,
    passwordHash: await cachedHash,
    disabled: opts.disabled ?? false,
    shopId,
    homeLocationId: opts.homeLocationId ?? null,
  });
}
