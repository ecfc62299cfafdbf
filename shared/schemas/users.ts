import { z } from 'zod';
import { ROLES } from '../roles';
import { emailSchema, timestampSchema, uuidSchema } from './common';
import { text } from './text';
import { userSchema } from './auth';

/** The team (admin): people, their roles and shops. */

// ---------- requests ----------

export const inviteBodySchema = z
  .object({
    email: emailSchema,
    name: text({ min: 1, max: 120 }),
    role: z.enum(ROLES),
    shopId: uuidSchema.optional().nullable(),
    /** The store's staff work at one store; without it, the chain's first. */
    homeLocationId: uuidSchema.optional().nullable(),
  })
  .refine((b) => b.role !== 'technician' || !!b.shopId, {
    path: ['shopId'],
    message: 'a technician belongs to a shop: choose one',
  });
export type InviteBody = z.infer<typeof inviteBodySchema>;

export const updateUserBodySchema = z
  .object({
    role: z.enum(ROLES).optional(),
    disabled: z.boolean().optional(),
    shopId: uuidSchema.nullable().optional(),
    homeLocationId: uuidSchema.nullable().optional(),
  })
  .refine((b) => Object.keys(b).length > 0, { message: 'nothing to change' });
export type UpdateUserBody = z.infer<typeof updateUserBodySchema>;

// ---------- responses ----------

export const teamMemberSchema = userSchema
  .extend({
    disabled: z.boolean(),
    shopName: z.string().nullable(),
    invitePending: z.boolean(),
    createdAt: timestampSchema,
  })
  .meta({ id: 'TeamMember' });
export type TeamMember = z.infer<typeof teamMemberSchema>;

export const teamMemberResponseSchema = z.object({ user: teamMemberSchema });
export type TeamMemberResponse = z.infer<typeof teamMemberResponseSchema>;

export const teamResponseSchema = z.object({ users: z.array(teamMemberSchema) });
export type TeamResponse = z.infer<typeof teamResponseSchema>;

/** POST /api/users/invite: the new member, and when the e-mailed link stops working. */
export const invitedResponseSchema = z.object({ user: teamMemberSchema, expiresAt: timestampSchema });
export type InvitedResponse = z.infer<typeof invitedResponseSchema>;

export const shopSchema = z.object({ id: uuidSchema, name: z.string() });
export type Shop = z.infer<typeof shopSchema>;

export const shopsResponseSchema = z.object({ shops: z.array(shopSchema) });
export type ShopsResponse = z.infer<typeof shopsResponseSchema>;
