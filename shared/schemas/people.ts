import { z } from 'zod';
import { ROLES } from '../roles';
import { emailField, roleField } from './fields';

export const personSchema = z.strictObject({
  id: z.number(),
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
  active: z.boolean(),
  createdAt: z.string(),
  deactivatedAt: z.string().nullable(),
  /** A working crib-station badge and a station PIN; never the token or the hash. */
  hasBadge: z.boolean(),
  hasPin: z.boolean(),
});
export type Person = z.infer<typeof personSchema>;

export const peopleListSchema = z.strictObject({ data: z.array(personSchema) });

export const inviteBodySchema = z.strictObject({ email: emailField, role: roleField });
export type InviteBody = z.infer<typeof inviteBodySchema>;

export const pendingInvitationSchema = z.strictObject({
  id: z.number(),
  email: z.string(),
  role: z.enum(ROLES),
  invitedBy: z.string(),
  createdAt: z.string(),
  expiresAt: z.string(),
});
export type PendingInvitation = z.infer<typeof pendingInvitationSchema>;
export const pendingInvitationListSchema = z.strictObject({ data: z.array(pendingInvitationSchema) });

export const updatePersonBodySchema = z
  .object({
    role: roleField.optional(),
    active: z.boolean({ error: 'Active must be true or false.' }).optional(),
  })
  .strict()
  .refine((b) => b.role !== undefined || b.active !== undefined, {
    error: 'Send a new role, an active flag, or both.',
  });
export type UpdatePersonBody = z.infer<typeof updatePersonBodySchema>;
