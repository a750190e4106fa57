import { z } from 'zod';

export const errorIssueSchema = z.object({
  path: z.string(),
  message: z.string(),
});

/** The one error envelope every failing API response uses. */
export const errorEnvelopeSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    issues: z.array(errorIssueSchema).optional(),
  }),
});

export type ErrorIssue = z.infer<typeof errorIssueSchema>;
export type ErrorEnvelope = z.infer<typeof errorEnvelopeSchema>;
