import { z } from 'zod';
import { idParam } from './fields';
import { isTimeZone } from '../time/chapter-time';

const signoffName = z
  .string({ error: 'Enter a name for the sign-off.' })
  .trim()
  .min(1, { error: 'Enter a name for the sign-off.' })
  .max(60, { error: 'Keep the name under 60 characters.' });

const signoffDescription = z.string({ error: 'The description is text.' }).trim().max(500, { error: 'Keep the description under 500 characters.' });

export const createSignoffBodySchema = z.object({ name: signoffName, description: signoffDescription.default('') }).strict();
export type CreateSignoffBody = z.input<typeof createSignoffBodySchema>;
export type CreateSignoffInput = z.output<typeof createSignoffBodySchema>;

export const updateSignoffBodySchema = z
  .object({ name: signoffName.optional(), description: signoffDescription.optional() })
  .strict()
  .refine((b) => b.name !== undefined || b.description !== undefined, { error: 'Send a new name, a new description, or both.' });
export type UpdateSignoffBody = z.infer<typeof updateSignoffBodySchema>;

export const grantSignoffBodySchema = z
  .object({
    userId: z
      .number({ error: 'Choose the person to sign off.' })
      .int({ error: 'Choose the person to sign off.' })
      .positive({ error: 'Choose the person to sign off.' }),
  })
  .strict();
export type GrantSignoffBody = z.output<typeof grantSignoffBodySchema>;

export const signoffParams = z.object({ id: idParam });
export const signoffHolderParams = z.object({ id: idParam, userId: idParam });

const person = z.strictObject({ id: z.number(), name: z.string() });

export const signoffHolderSchema = z.strictObject({
  userId: z.number(),
  name: z.string(),
  /** False when the person was deactivated: the grant stays on record but they cannot sign in. */
  active: z.boolean(),
  grantedAt: z.string(),
  grantedBy: person,
});
export type SignoffHolder = z.infer<typeof signoffHolderSchema>;

export const signoffSchema = z.strictObject({
  id: z.number(),
  name: z.string(),
  description: z.string(),
  /** Tools in the crib (not retired) that need this sign-off. */
  toolCount: z.number(),
  holders: z.array(signoffHolderSchema),
});
export type Signoff = z.infer<typeof signoffSchema>;
export const signoffListSchema = z.strictObject({ data: z.array(signoffSchema) });

export const signoffGrantSchema = z.strictObject({
  id: z.number(),
  signoff: person,
  holder: person,
  grantedAt: z.string(),
  grantedBy: person,
});
export type SignoffGrant = z.infer<typeof signoffGrantSchema>;

export const mySignoffSchema = z.strictObject({
  id: z.number(),
  name: z.string(),
  description: z.string(),
  grantedAt: z.string(),
  grantedBy: person,
});
export type MySignoff = z.infer<typeof mySignoffSchema>;
export const mySignoffListSchema = z.strictObject({ data: z.array(mySignoffSchema) });

/** How long a returned tool waits for the first person in its queue: an hour to two weeks. */
export const HOLD_HOURS_MIN = 1;
export const HOLD_HOURS_MAX = 336;

export const cribSettingsSchema = z.strictObject({
  holdHours: z.number(),
  /** The chapter's IANA time zone: every due date, "days late", digest and reminder counts its days there. */
  timeZone: z.string(),
});
export type CribSettingsView = z.infer<typeof cribSettingsSchema>;

export const chapterTimeZoneSchema = z
  .string({ error: 'Choose the chapter time zone from the list, such as America/Denver.' })
  .refine(isTimeZone, { error: 'That is not a time zone this server knows; choose one from the list, such as America/Denver.' });

/** The lead changes one setting at a time, or both. */
export const updateCribSettingsBodySchema = z
  .object({
    holdHours: z
      .number({ error: 'Enter the hold time in whole hours.' })
      .int({ error: 'Enter the hold time in whole hours.' })
      .min(HOLD_HOURS_MIN, { error: `Hold a tool for at least ${HOLD_HOURS_MIN} hour.` })
      .max(HOLD_HOURS_MAX, { error: `Hold a tool for at most ${HOLD_HOURS_MAX} hours (two weeks).` })
      .optional(),
    timeZone: chapterTimeZoneSchema.optional(),
  })
  .strict()
  .refine((body) => body.holdHours !== undefined || body.timeZone !== undefined, { error: 'Change the hold time or the time zone.' });
export type UpdateCribSettingsBody = z.output<typeof updateCribSettingsBodySchema>;
