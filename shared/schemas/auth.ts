import { z } from 'zod';
import { ROLES } from '../roles';
import { emailSchema, uuidSchema } from './common';
import { linkTokenSchema, text } from './text';

export const PASSWORD_MIN_LENGTH = 10;
export const INVITE_TTL_HOURS = 72;

/** A password arrives exactly as typed: never trimmed, but no control characters. */
const passwordSchema = text({ max: 200, trim: false });

// ---------- requests ----------

export const loginBodySchema = z.object({
  email: emailSchema,
  password: passwordSchema.min(1),
});
export type LoginBody = z.infer<typeof loginBodySchema>;

export const acceptInviteBodySchema = z.object({
  token: linkTokenSchema,
  password: passwordSchema.min(PASSWORD_MIN_LENGTH, `use at least ${PASSWORD_MIN_LENGTH} characters`),
});
export type AcceptInviteBody = z.infer<typeof acceptInviteBodySchema>;

export const inviteTokenParamSchema = z.object({ token: linkTokenSchema });

// ---------- responses ----------

/** The signed-in person as the API shows them: never a password hash. */
export const userSchema = z
  .object({
    id: uuidSchema,
    email: z.string(),
    name: z.string(),
    role: z.enum(ROLES),
    shopId: uuidSchema.nullable(),
    /** The store whose stock is "here" for this person; null for a shop's technician. */
    homeLocationId: uuidSchema.nullable(),
  })
  .meta({ id: 'User' });
export type User = z.infer<typeof userSchema>;

/** POST /api/auth/login, GET /api/auth/me, POST /api/auth/accept-invite. */
export const userResponseSchema = z.object({ user: userSchema });
export type UserResponse = z.infer<typeof userResponseSchema>;

/** GET /api/auth/invite/:token: whom the link invites, for the set-password form. */
export const invitationResponseSchema = z.object({ invitation: z.object({ email: z.string(), name: z.string() }) });
export type InvitationResponse = z.infer<typeof invitationResponseSchema>;

/** GET /api/auth/csrf: the token every state-changing request sends in `x-csrf-token`. */
export const csrfResponseSchema = z.object({ token: z.string() });
export type CsrfResponse = z.infer<typeof csrfResponseSchema>;
