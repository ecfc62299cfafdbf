import type { TeamMember, User } from '../../shared/schemas/auth';
import type { UserEntity } from '../entities';

/** The only way a user row becomes JSON: no password hash ever leaves. */
export function presentUser(u: UserEntity): User {
  return { id: u.id, email: u.email, name: u.name, role: u.role, shopId: u.shopId };
}

export function presentTeamMember(u: UserEntity): TeamMember {
  return {
    ...presentUser(u),
    disabled: u.disabled,
    shopName: u.shop?.name ?? null,
    invitePending: u.passwordHash === null,
    createdAt: u.createdAt.toISOString(),
  };
}
