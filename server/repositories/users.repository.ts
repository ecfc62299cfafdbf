import type { EntityManager } from 'typeorm';
import { z } from 'zod';
import type { Role } from '../../shared/roles';
import { queryCount, queryRows, type Executor } from '../db/executor';
import { ShopEntity, UserEntity } from '../entities';

/** The team, admins first, each with their shop. */
export function listUsers(ex: EntityManager): Promise<UserEntity[]> {
  return ex.getRepository(UserEntity).find({ relations: { shop: true }, order: { role: 'ASC', name: 'ASC' } });
}

export function listShops(ex: EntityManager): Promise<ShopEntity[]> {
  return ex.getRepository(ShopEntity).find({ order: { name: 'ASC' } });
}

export function findShop(ex: EntityManager, id: string): Promise<ShopEntity | null> {
  return ex.getRepository(ShopEntity).findOneBy({ id });
}

export function findUser(ex: EntityManager, id: string): Promise<UserEntity | null> {
  return ex.getRepository(UserEntity).findOneBy({ id });
}

/** With its shop joined, as the team list shows a user. */
export function findUserWithShop(ex: EntityManager, id: string): Promise<UserEntity | null> {
  return ex.getRepository(UserEntity).findOne({ where: { id }, relations: { shop: true } });
}

/** E-mail addresses are stored lower-cased. */
export function findUserByEmail(ex: EntityManager, email: string): Promise<UserEntity | null> {
  return ex.getRepository(UserEntity).findOneBy({ email: email.trim().toLowerCase() });
}

export interface NewUser {
  email: string;
  name: string;
  role: Role;
  shopId: string | null;
  homeLocationId: string | null;
}

/** A user without a password: an invitation sets it. */
export function insertUser(ex: EntityManager, u: NewUser): Promise<UserEntity> {
  const repo = ex.getRepository(UserEntity);
  return repo.save(repo.create({ ...u, passwordHash: null }));
}

export async function updateUserAccess(
  ex: EntityManager,
  id: string,
  access: { role: Role; shopId: string | null; homeLocationId: string | null; disabled: boolean },
): Promise<void> {
  await ex.getRepository(UserEntity).update({ id }, access);
}

export async function setPasswordHash(ex: EntityManager, id: string, passwordHash: string): Promise<void> {
  await ex.getRepository(UserEntity).update({ id }, { passwordHash });
}

const emailRow = z.object({ email: z.string() });

/** Every buyer who can sign in: the people who keep supplier prices. */
export async function buyerEmails(ex: Executor): Promise<string[]> {
  const rows = await queryRows(ex, emailRow, `SELECT email FROM "user" WHERE role = 'buyer' AND NOT disabled ORDER BY email`);
  return rows.map((r) => r.email);
}

/** Deletes every stored session of a user; answers how many there were. */
export function deleteSessionsOf(ex: Executor, userId: string): Promise<number> {
  return queryCount(
    ex,
    `WITH gone AS (DELETE FROM session WHERE sess->'passport'->>'user' = $1 RETURNING 1) SELECT count(*)::int AS n FROM gone`,
    [userId],
  );
}
