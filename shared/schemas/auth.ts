import { z } from 'zod';
import { ROLES } from '../roles';
import { emailField, linkTokenField, newPasswordField, personNameField } from './fields';

export const userSchema = z.strictObject({
  id: z.number(),
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
});
export type User = z.infer<typeof userSchema>;

export const loginBodySchema = z.strictObject({
  email: emailField,
  password: z.string({ error: 'Enter your password.' }).min(1, { error: 'Enter your password.' }).max(200),
});
export type LoginBody = z.infer<typeof loginBodySchema>;

/**
 * Who is signed in, with the chapter's time zone: the client writes every day and moment in it. A
 * visitor who is signed out is no error: the answer is 200 with `user: null`.
 */
export const meResponseSchema = z.strictObject({ user: userSchema.nullable(), timeZone: z.string() });
export type MeResponse = z.infer<typeof meResponseSchema>;
export const loginResponseSchema = meResponseSchema.extend({ user: userSchema, csrfToken: z.string() });
export type LoginResponse = z.infer<typeof loginResponseSchema>;
export const csrfResponseSchema = z.strictObject({ token: z.string() });

export const resetRequestBodySchema = z.strictObject({ email: emailField });
export type ResetRequestBody = z.infer<typeof resetRequestBodySchema>;

export const resetConfirmBodySchema = z.strictObject({
  token: linkTokenField,
  password: newPasswordField,
});
export type ResetConfirmBody = z.infer<typeof resetConfirmBodySchema>;

export const acceptInvitationBodySchema = z.strictObject({
  token: linkTokenField,
  name: personNameField,
  password: newPasswordField,
});
export type AcceptInvitationBody = z.infer<typeof acceptInvitationBodySchema>;

export const invitationPreviewSchema = z.strictObject({
  email: z.string(),
  role: z.enum(ROLES),
  invitedBy: z.string(),
  expiresAt: z.string(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;
