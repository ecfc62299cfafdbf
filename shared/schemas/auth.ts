import { z } from 'zod';
import { ROLES } from '../roles';

export const PASSWORD_MIN_LENGTH = 10;
export const INVITE_TTL_HOURS = 72;

export const emailSchema = z.string().trim().toLowerCase().pipe(z.email()).pipe(z.string().max(254));

export const loginBodySchema = z.object({
  email: emailSchema,
  password: z.string().min(1).max(200),
});
export type LoginBody = z.infer<typeof loginBodySchema>;

export const userSchema = z.object({
  id: z.string().uuid(),
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
  shopId: z.string().uuid().nullable(),
});
export type User = z.infer<typeof userSchema>;

export const userResponseSchema = z.object({ user: userSchema });

export const teamMemberSchema = userSchema.extend({
  disabled: z.boolean(),
  shopName: z.string().nullable(),
  invitePending: z.boolean(),
  createdAt: z.string(),
});
export type TeamMember = z.infer<typeof teamMemberSchema>;

export const inviteBodySchema = z
  .object({
    email: emailSchema,
    name: z.string().trim().min(1).max(120),
    role: z.enum(ROLES),
    shopId: z.string().uuid().optional().nullable(),
  })
  .refine((b) => b.role !== 'technician' || !!b.shopId, {
    path: ['shopId'],
    message: 'a technician belongs to a shop: choose one',
  });
export type InviteBody = z.infer<typeof inviteBodySchema>;

export const acceptInviteBodySchema = z.object({
  token: z.string().min(20).max(200),
  password: z.string().min(PASSWORD_MIN_LENGTH, `use at least ${PASSWORD_MIN_LENGTH} characters`).max(200),
});
export type AcceptInviteBody = z.infer<typeof acceptInviteBodySchema>;

export const updateUserBodySchema = z
  .object({ role: z.enum(ROLES).optional(), disabled: z.boolean().optional(), shopId: z.string().uuid().nullable().optional() })
  .refine((b) => Object.keys(b).length > 0, { message: 'nothing to change' });
export type UpdateUserBody = z.infer<typeof updateUserBodySchema>;

export const idParamSchema = z.object({ id: z.string().uuid() });

export const shopSchema = z.object({ id: z.string().uuid(), name: z.string() });
export type Shop = z.infer<typeof shopSchema>;

export const outboxMessageSchema = z.object({
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string(),
  date: z.string(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
