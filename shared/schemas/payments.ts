import { z } from 'zod';

/** The hosted checkout takes no less than this; a smaller part of the tab is settled in cash. */
export const MIN_ONLINE_PAYMENT_CENTS = 50;

export const checkoutBodySchema = z
  .object({
    amountCents: z
      .number({ error: 'Enter the amount to pay in cents.' })
      .int({ error: 'Enter the amount in whole cents.' })
      .min(MIN_ONLINE_PAYMENT_CENTS, { error: 'Online payments are at least $0.50.' })
      .optional(),
  })
  .strict();
export type CheckoutBody = z.infer<typeof checkoutBodySchema>;

export const checkoutResponseSchema = z.strictObject({ url: z.url() });
export type CheckoutResponse = z.infer<typeof checkoutResponseSchema>;
