import bcrypt from 'bcryptjs';

/** bcrypt cost: 12 is about a quarter second here, well above the floor of 10. */
export const BCRYPT_COST = 12;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

// A hash to compare against when the account does not exist, so both paths take the same time.
const DUMMY_HASH = bcrypt.hashSync('arcwise-no-such-user', BCRYPT_COST);

export async function verifyPassword(password: string, hash: string | null): Promise<boolean> {
  const ok = await bcrypt.compare(password, hash ?? DUMMY_HASH);
  return ok && hash !== null;
}
