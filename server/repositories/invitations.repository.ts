import { IsNull, type EntityManager } from 'typeorm';
import { z } from 'zod';
import { ROLES } from '../../shared/roles';
import { queryOne, type Executor } from '../db/executor';
import { InvitationEntity } from '../entities';

export interface NewInvitation {
  userId: string;
  tokenHash: string;
  expiresAt: Date;
  invitedBy: string;
}

export function insertInvitation(ex: EntityManager, inv: NewInvitation): Promise<InvitationEntity> {
  const repo = ex.getRepository(InvitationEntity);
  return repo.save(repo.create(inv));
}

/** The invitation whose token has this hash and that was not used yet (it may have expired). */
export function findUnusedInvitation(ex: EntityManager, tokenHash: string): Promise<InvitationEntity | null> {
  return ex.getRepository(InvitationEntity).findOneBy({ tokenHash, usedAt: IsNull() });
}

/** Marks it used in the statement that checks it is unused, so a double submit uses it once; true when this call did. */
export async function claimInvitation(ex: EntityManager, id: string): Promise<boolean> {
  const claimed = await ex
    .createQueryBuilder()
    .update(InvitationEntity)
    .set({ usedAt: () => 'now()' })
    .where('id = :id AND used_at IS NULL', { id })
    .execute();
  return claimed.affected === 1;
}

const inviteeRowSchema = z.object({ email: z.string(), name: z.string(), role: z.enum(ROLES) });
export type InviteeRow = z.infer<typeof inviteeRowSchema>;

/** Gives an open invitation a new token hash; the invitee, or null when it was used or has expired. */
export function reissueInvitationToken(ex: Executor, invitationId: string, tokenHash: string): Promise<InviteeRow | null> {
  return queryOne(
    ex,
    inviteeRowSchema,
    `UPDATE invitation i SET token_hash = $2 FROM "user" u
      WHERE i.id = $1 AND u.id = i.user_id AND i.used_at IS NULL AND i.expires_at > now()
      RETURNING u.email, u.name, u.role`,
    [invitationId, tokenHash],
  );
}
