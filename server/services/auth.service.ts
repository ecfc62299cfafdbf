import type { DataSource } from 'typeorm';
import { UserEntity } from '../entities';
import { verifyPassword } from './password';

/** Checks an e-mail and password; null for unknown, disabled, uninvited or wrong — the caller says the same for all. */
export async function verifyCredentials(ds: DataSource, email: string, password: string): Promise<UserEntity | null> {
  const user = await ds.getRepository(UserEntity).findOneBy({ email: email.trim().toLowerCase() });
  const ok = await verifyPassword(password, user?.passwordHash ?? null);
  if (!user || !ok || user.disabled) return null;
  return user;
}

export async function findActiveUser(ds: DataSource, id: string): Promise<UserEntity | null> {
  const user = await ds.getRepository(UserEntity).findOneBy({ id });
  return user && !user.disabled && user.passwordHash ? user : null;
}

/** Ends every stored session of a user (on disable or role change). */
export async function endSessionsOf(ds: DataSource, userId: string): Promise<number> {
  const rows: { n: number }[] = await ds.query(
    `WITH gone AS (DELETE FROM session WHERE sess->'passport'->>'user' = $1 RETURNING 1) SELECT count(*)::int AS n FROM gone`,
    [userId],
  );
  return rows[0]?.n ?? 0;
}
