import { z } from 'zod';
import { idParam } from './fields';

export const SIGNOFF_REQUEST_STATES = ['open', 'granted', 'declined'] as const;
export type SignoffRequestState = (typeof SIGNOFF_REQUEST_STATES)[number];

/** A member asks from the tool's page; the note is optional ("I did the drill course in March"). */
export const askSignoffBodySchema = z
  .object({
    toolCode: z.string({ error: 'Say which tool the sign-off is for.' }).trim().min(1, { error: 'Say which tool the sign-off is for.' }).max(40),
    note: z.string({ error: 'The note is text.' }).trim().max(500, { error: 'Keep the note under 500 characters.' }).default(''),
  })
  .strict();
export type AskSignoffBody = z.input<typeof askSignoffBodySchema>;

export const declineSignoffRequestBodySchema = z
  .object({
    reason: z
      .string({ error: 'Give the reason, so the member knows what to do next.' })
      .trim()
      .min(1, { error: 'Give the reason, so the member knows what to do next.' })
      .max(500, { error: 'Keep the reason under 500 characters.' }),
  })
  .strict();
export type DeclineSignoffRequestBody = z.input<typeof declineSignoffRequestBodySchema>;

export const signoffRequestParams = z.object({ id: idParam });

const named = z.strictObject({ id: z.number(), name: z.string() });

export const signoffRequestSchema = z.strictObject({
  id: z.number(),
  signoff: named,
  member: named,
  tool: z.strictObject({ code: z.string(), name: z.string() }),
  note: z.string(),
  state: z.enum(SIGNOFF_REQUEST_STATES),
  askedAt: z.string(),
  closedAt: z.string().nullable(),
  declineReason: z.string().nullable(),
});
export type SignoffRequest = z.infer<typeof signoffRequestSchema>;
export const signoffRequestListSchema = z.strictObject({ data: z.array(signoffRequestSchema) });
