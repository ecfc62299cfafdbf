import type { DataSource, EntityManager } from 'typeorm';
import type { Role } from '../../shared/roles';
import { passwordProblem } from '../../shared/password-policy';
import { INVITE_TTL_HOURS, type AcceptInviteBody } from '../../shared/schemas/auth';
import { type InviteBody, type UpdateUserBody } from '../../shared/schemas/users';
import type { InvitationEntity, ShopEntity, UserEntity } from '../entities';
import { AppError } from '../errors';
import type { JobQueue } from '../jobs/queue';
import { audit } from '../repositories/audit.repository';
import { claimInvitation, findUnusedInvitation, insertInvitation } from '../repositories/invitations.repository';
import {
  findShop,
  findUser,
  findUserByEmail,
  findUserWithShop,
  insertUser,
  listShops as shopRows,
  listUsers as userRows,
  setPasswordHash,
  updateUserAccess,
} from '../repositories/users.repository';
import { findLocation, firstLocationId } from '../repositories/locations.repository';
import { endSessionsOf } from './auth.service';
import { inviteTokenHash, newInviteToken } from './invite-token';
import { hashPassword } from './password';

/** The store's staff have a home store (the one asked for, else the chain's first); a shop's technician has none. */
async function homeStoreFor(m: EntityManager, role: Role, wanted: string | null): Promise<string | null> {
  if (role === 'technician') return null;
  if (wanted && !(await findLocation(m, wanted))) throw AppError.badRequest('homeLocationId: no such store');
  return wanted ?? (await firstLocationId(m));
}

export function listUsers(ds: DataSource): Promise<UserEntity[]> {
  return userRows(ds.manager);
}

export function listShops(ds: DataSource): Promise<ShopEntity[]> {
  return shopRows(ds.manager);
}

/**
 * Creates the user without a password and, in the same transaction, queues the e-mail with a
 * one-time link to set one. The mail job issues the link's token (see invitation-mail.ts); until
 * then the stored hash is of a token nobody holds. Only hashes are stored, so a database reader
 * cannot accept an invitation.
 */
export async function inviteUser(
  ds: DataSource,
  jobs: JobQueue,
  actorId: string,
  body: InviteBody,
): Promise<{ user: UserEntity; expiresAt: Date }> {
  const expiresAt = new Date(Date.now() + INVITE_TTL_HOURS * 3600 * 1000);
  const user = await ds.transaction(async (m) => {
    if (await findUserByEmail(m, body.email)) {
      throw AppError.conflict(`${body.email} already has an account.`);
    }
    const shopId = body.role === 'technician' ? (body.shopId ?? null) : null;
    if (shopId && !(await findShop(m, shopId))) throw AppError.badRequest('shopId: no such shop');
    const homeLocationId = await homeStoreFor(m, body.role, body.homeLocationId ?? null);
    const created = await insertUser(m, { email: body.email, name: body.name, role: body.role, shopId, homeLocationId });
    const invitation = await insertInvitation(m, {
      userId: created.id,
      tokenHash: inviteTokenHash(newInviteToken()),
      expiresAt,
      invitedBy: actorId,
    });
    await audit(m, {
      actorId,
      action: 'user.invite',
      entityType: 'user',
      entityId: created.id,
      data: { email: body.email, role: body.role },
    });
    await jobs.enqueue(m, 'mail.send', { kind: 'invitation', invitationId: invitation.id });
    return created;
  });
  return { user, expiresAt };
}

async function findOpenInvitation(ds: DataSource, token: string): Promise<InvitationEntity> {
  const inv = await findUnusedInvitation(ds.manager, inviteTokenHash(token));
  if (!inv || inv.expiresAt.getTime() < Date.now()) {
    throw new AppError(400, 'bad_request', 'This invitation link is invalid, used or expired. Ask an admin for a new one.');
  }
  return inv;
}

async function invitedUser(ds: DataSource, inv: InvitationEntity): Promise<UserEntity> {
  const user = await findUser(ds.manager, inv.userId);
  if (!user) throw new Error(`invitation ${inv.id} has no user`);
  return user;
}

export async function describeInvitation(ds: DataSource, token: string): Promise<{ email: string; name: string }> {
  const user = await invitedUser(ds, await findOpenInvitation(ds, token));
  return { email: user.email, name: user.name };
}

export async function acceptInvite(ds: DataSource, body: AcceptInviteBody): Promise<UserEntity> {
  const inv = await findOpenInvitation(ds, body.token);
  const invited = await invitedUser(ds, inv);
  const problem = passwordProblem(body.password, invited.email);
  if (problem) throw new AppError(400, 'validation_failed', `password: ${problem}`, [{ field: 'password', message: problem }]);
  const passwordHash = await hashPassword(body.password);
  return ds.transaction(async (m) => {
    if (!(await claimInvitation(m, inv.id))) throw AppError.badRequest('This invitation link was already used.');
    await setPasswordHash(m, inv.userId, passwordHash);
    await audit(m, { actorId: inv.userId, action: 'user.accept-invite', entityType: 'user', entityId: inv.userId });
    const user = await findUser(m, inv.userId);
    if (!user) throw AppError.notFound('User');
    return user;
  });
}

export async function updateUser(ds: DataSource, actorId: string, id: string, body: UpdateUserBody): Promise<UserEntity> {
  const user = await ds.transaction(async (m) => {
    const u = await findUserWithShop(m, id);
    if (!u) throw AppError.notFound('User');
    if (id === actorId && (body.disabled === true || (body.role && body.role !== 'admin'))) {
      throw AppError.badRequest('You cannot disable yourself or drop your own admin role.');
    }
    const role = body.role ?? u.role;
    const shopId = role === 'technician' ? (body.shopId ?? u.shopId) : null;
    if (role === 'technician' && !shopId) throw AppError.badRequest('shopId: a technician belongs to a shop');
    const homeLocationId = await homeStoreFor(m, role, body.homeLocationId ?? u.homeLocationId);
    await updateUserAccess(m, id, { role, shopId, homeLocationId, disabled: body.disabled ?? u.disabled });
    await audit(m, { actorId, action: 'user.update', entityType: 'user', entityId: id, data: { ...body } });
    const updated = await findUserWithShop(m, id);
    if (!updated) throw AppError.notFound('User');
    return updated;
  });
  // A disabled user, or one whose rights changed, signs in again.
  if (body.disabled === true || body.role !== undefined) await endSessionsOf(ds, id);
  return user;
}
