import type { DataSource } from 'typeorm';
import type { UserEntity } from '../entities';
import { deleteSessionsOf, findUser, findUserByEmail } from '../repositories/users.repository';
import { verifyPassword } from './password';

/** Checks an e-mail and password; null for unknown, disabled, uninvited or wrong — the caller says the same for all. */
export async function verifyCredentials(ds: DataSource, email: string, password: string): Promise<UserEntity | null> {
  const user = await findUserByEmail(ds.manager, email);
  const ok = await verifyPassword(password, user?.passwordHash ?? null);
  if (!user || !ok || user.disabled) return null;
  return user;
}

export async function findActiveUser(ds: DataSource, id: string): Promise<UserEntity | null> {
  const user = await findUser(ds.manager, id);
  return user && !user.disabled && user.passwordHash ? user : null;
}

/** Ends every stored session of a user (on disable or role change). */
export function endSessionsOf(ds: DataSource, userId: string): Promise<number> {
  return deleteSessionsOf(ds.manager, userId);
}
