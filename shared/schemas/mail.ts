import { z } from 'zod';

export const caughtMailSchema = z.strictObject({
  id: z.number(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  links: z.array(z.string()),
  receivedAt: z.string(),
});
export type CaughtMail = z.infer<typeof caughtMailSchema>;
export const caughtMailListSchema = z.strictObject({ data: z.array(caughtMailSchema), catching: z.boolean() });
export type CaughtMailList = z.infer<typeof caughtMailListSchema>;
