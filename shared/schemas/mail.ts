import { z } from 'zod';
import { idParam } from './fields';

export const MAIL_STATES = ['waiting', 'sent', 'failed'] as const;
export type MailState = (typeof MAIL_STATES)[number];
export const MAIL_STATE_LABELS: Record<MailState, string> = { waiting: 'Waiting to send', sent: 'Sent', failed: 'Failed' };

/** The stand-in for the secret part of a link a reader may not use (a reset link for someone else). */
export const MASKED_TOKEN = '••••••';

/** One message from the outbox, as Sent mail and My mail show it. */
export const mailMessageSchema = z.strictObject({
  id: z.number(),
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  /** The http(s) links in the text, in order, each once; a masked one ends in MASKED_TOKEN. */
  links: z.array(z.string()),
  state: z.enum(MAIL_STATES),
  /** Failed attempts since it was written or last retried. */
  attempts: z.number(),
  lastError: z.string().nullable(),
  /** When a waiting message is tried next. */
  nextAttemptAt: z.string().nullable(),
  createdAt: z.string(),
  sentAt: z.string().nullable(),
});
export type MailMessage = z.infer<typeof mailMessageSchema>;
export const mailListSchema = z.strictObject({ data: z.array(mailMessageSchema), catching: z.boolean() });
export type MailList = z.infer<typeof mailListSchema>;

export const mailIdParams = z.object({ id: idParam });
