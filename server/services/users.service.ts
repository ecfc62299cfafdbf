import { createHash, randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { IsNull } from 'typeorm';
import { passwordProblem } from '../../shared/password-policy';
import { INVITE_TTL_HOURS, type AcceptInviteBody, type InviteBody, type UpdateUserBody } from '../../shared/schemas/auth';
import { InvitationEntity, ShopEntity, UserEntity } from '../entities';
import { AppError } from '../errors';
import { escapeHtml, type Mailer } from '../mail/mailer';
import { audit } from './audit.service';
import { endSessionsOf } from './auth.service';
import { hashPassword } from './password';

const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

export async function listUsers(ds: DataSource): Promise<UserEntity[]> {
  return ds.getRepository(UserEntity).find({ relations: { shop: true }, order: { role: 'ASC', name: 'ASC' } });
}

export async function listShops(ds: DataSource): Promise<ShopEntity[]> {
  return ds.getRepository(ShopEntity).find({ order: { name: 'ASC' } });
}

/**
 * Creates the user without a password and e-mails a one-time link to set one. The token is sent
 * once and only its hash is stored, so a database reader cannot accept an invitation.
 */
export async function inviteUser(
  ds: DataSource,
  mailer: Mailer,
  appUrl: string,
  actorId: string,
  body: InviteBody,
): Promise<{ user: UserEntity; expiresAt: Date }> {
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(Date.now() + INVITE_TTL_HOURS * 3600 * 1000);
  const user = await ds.transaction(async (m) => {
    if (await m.findOneBy(UserEntity, { email: body.email })) {
      throw AppError.conflict(`${body.email} already has an account.`);
    }
    const shopId = body.role === 'technician' ? (body.shopId ?? null) : null;
    if (shopId && !(await m.findOneBy(ShopEntity, { id: shopId }))) throw AppError.badRequest('shopId: no such shop');
    const created = await m.save(
      UserEntity,
      m.create(UserEntity, { email: body.email, name: body.name, role: body.role, shopId, passwordHash: null }),
    );
    await m.insert(InvitationEntity, { userId: created.id, tokenHash: sha256(token), expiresAt, invitedBy: actorId });
    await audit(m, {
      actorId,
      action: 'user.invite',
      entityType: 'user',
      entityId: created.id,
      data: { email: body.email, role: body.role },
    });
    return created;
  });
  const link = `${appUrl}/accept-invite?token=${encodeURIComponent(token)}`;
  await mailer.send({
    to: body.email,
    subject: 'You are invited to Arcwise',
    text: `Hello ${body.name},\n\nyou have been invited to Arcwise as ${body.role}. Set your password here (the link works once, for ${INVITE_TTL_HOURS} hours):\n\n${link}\n`,
    html: `<p>Hello ${escapeHtml(body.name)},</p><p>you have been invited to Arcwise as <b>${escapeHtml(body.role)}</b>. Set your password here (the link works once, for ${INVITE_TTL_HOURS} hours):</p><p><a href="${escapeHtml(link)}">${escapeHtml(link)}</a></p>`,
  });
  return { user, expiresAt };
}

async function findOpenInvitation(ds: DataSource, token: string): Promise<InvitationEntity> {
  const inv = await ds.getRepository(InvitationEntity).findOneBy({ tokenHash: sha256(token), usedAt: IsNull() });
  if (!inv || inv.expiresAt.getTime() < Date.now()) {
    throw new AppError(400, 'bad_request', 'This invitation link is invalid, used or expired. Ask an admin for a new one.');
  }
  return inv;
}

export async function describeInvitation(ds: DataSource, token: string): Promise<{ email: string; name: string }> {
  const inv = await findOpenInvitation(ds, token);
  const user = await ds.getRepository(UserEntity).findOneByOrFail({ id: inv.userId });
  return { email: user.email, name: user.name };
}

export async function acceptInvite(ds: DataSource, body: AcceptInviteBody): Promise<UserEntity> {
  const inv = await findOpenInvitation(ds, body.token);
  const invited = await ds.getRepository(UserEntity).findOneByOrFail({ id: inv.userId });
  const problem = passwordProblem(body.password, invited.email);
  if (problem) throw new AppError(400, 'validation_failed', `password: ${problem}`, [{ field: 'password', message: problem }]);
  const passwordHash = await hashPassword(body.password);
  return ds.transaction(async (m) => {
    // Marking it used in the same statement that checks it keeps a double submit from using it twice.
    const claimed = await m
      .createQueryBuilder()
      .update(InvitationEntity)
      .set({ usedAt: () => 'now()' })
      .where('id = :id AND used_at IS NULL', { id: inv.id })
      .execute();
    if (claimed.affected !== 1) throw AppError.badRequest('This invitation link was already used.');
    await m.update(UserEntity, { id: inv.userId }, { passwordHash });
    await audit(m, { actorId: inv.userId, action: 'user.accept-invite', entityType: 'user', entityId: inv.userId });
    return m.findOneByOrFail(UserEntity, { id: inv.userId });
  });
}

export async function updateUser(ds: DataSource, actorId: string, id: string, body: UpdateUserBody): Promise<UserEntity> {
  const user = await ds.transaction(async (m) => {
    const u = await m.findOne(UserEntity, { where: { id }, relations: { shop: true } });
    if (!u) throw AppError.notFound('User');
    if (id === actorId && (body.disabled === true || (body.role && body.role !== 'admin'))) {
      throw AppError.badRequest('You cannot disable yourself or drop your own admin role.');
    }
    const role = body.role ?? u.role;
    const shopId = role === 'technician' ? (body.shopId ?? u.shopId) : null;
    if (role === 'technician' && !shopId) throw AppError.badRequest('shopId: a technician belongs to a shop');
    await m.update(UserEntity, { id }, { role, shopId, disabled: body.disabled ?? u.disabled });
    await audit(m, { actorId, action: 'user.update', entityType: 'user', entityId: id, data: { ...body } });
    return m.findOneOrFail(UserEntity, { where: { id }, relations: { shop: true } });
  });
  // A disabled user, or one whose rights changed, signs in again.
  if (body.disabled === true || body.role !== undefined) await endSessionsOf(ds, id);
  return user;
}
