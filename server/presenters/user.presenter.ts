import type { InvitationResponse, User, UserResponse } from '../../shared/schemas/auth';
import type { InvitedResponse, ShopsResponse, TeamMember, TeamMemberResponse, TeamResponse } from '../../shared/schemas/users';
import type { ShopEntity, UserEntity } from '../entities';

/** The only way a user row becomes JSON: no password hash ever leaves. */
export function presentUser(u: UserEntity): User {
  return { id: u.id, email: u.email, name: u.name, role: u.role, shopId: u.shopId, homeLocationId: u.homeLocationId };
}

/** POST /api/auth/login, GET /api/auth/me, POST /api/auth/accept-invite. */
export const presentUserResponse = (user: User): UserResponse => ({
  user: { id: user.id, email: user.email, name: user.name, role: user.role, shopId: user.shopId, homeLocationId: user.homeLocationId },
});

export const presentInvitation = (invitation: { email: string; name: string }): InvitationResponse => ({
  invitation: { email: invitation.email, name: invitation.name },
});

export function presentTeamMember(u: UserEntity): TeamMember {
  return {
    ...presentUser(u),
    disabled: u.disabled,
    shopName: u.shop?.name ?? null,
    invitePending: u.passwordHash === null,
    createdAt: u.createdAt.toISOString(),
  };
}

export const presentTeam = (users: UserEntity[]): TeamResponse => ({ users: users.map(presentTeamMember) });
export const presentTeamMemberResponse = (u: UserEntity): TeamMemberResponse => ({ user: presentTeamMember(u) });
export const presentInvited = (u: UserEntity, expiresAt: Date): InvitedResponse => ({
  user: presentTeamMember(u),
  expiresAt: expiresAt.toISOString(),
});

export const presentShops = (shops: ShopEntity[]): ShopsResponse => ({ shops: shops.map((s) => ({ id: s.id, name: s.name })) });
