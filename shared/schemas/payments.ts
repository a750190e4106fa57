import { z } from 'zod';
import { idParam } from './fields';
import { PAYMENT_METHODS } from './payment-methods';
import { dollarsField } from './stock-money';

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

// ---- The lead's list of payments, refunds and the CSV export ----

const refundCentsField = z
  .number({ error: 'Enter the amount to refund in cents.' })
  .int({ error: 'Enter the amount in whole cents.' })
  .positive({ error: 'A refund is more than $0.00.' });

/** POST /api/payments/:id/refund: the whole unrefunded amount when amountCents is left out. */
export const refundBodySchema = z.object({ amountCents: refundCentsField.optional() }).strict();
export type RefundBody = z.infer<typeof refundBodySchema>;

/** The refund confirm step: the amount typed in dollars and cents, sent as cents. */
export const refundFormSchema = z.object({ amount: dollarsField('Enter the amount to refund.', refundCentsField) });

export const paymentParams = z.object({ id: idParam });

const chapterDayField = (what: string) => z.iso.date({ error: `Give the ${what} day like 2026-11-30.` }).optional();

/** Filters on the list and the export: whole chapter days, both ends included, and the method. */
export const paymentsQuerySchema = z
  .object({
    from: chapterDayField('first'),
    to: chapterDayField('last'),
    method: z.enum(PAYMENT_METHODS, { error: 'method is cash or online.' }).optional(),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { path: ['to'], error: 'The last day is before the first day: swap them.' });
export type PaymentsQuery = z.infer<typeof paymentsQuerySchema>;

const person = z.strictObject({ id: z.number(), name: z.string() });

/** One payment on the lead's list: cash or online, with what was refunded and what is left to refund. */
export const paymentListItemSchema = z.strictObject({
  id: z.number(),
  member: person,
  amountCents: z.number(),
  method: z.enum(PAYMENT_METHODS),
  refundedCents: z.number(),
  /** What may still be refunded through the provider: 0 for cash, which is handed back in person. */
  refundableCents: z.number(),
  at: z.string(),
  recordedBy: person,
  note: z.string(),
});
export type PaymentListItem = z.infer<typeof paymentListItemSchema>;
export const paymentListSchema = z.strictObject({ data: z.array(paymentListItemSchema) });
export type PaymentList = z.infer<typeof paymentListSchema>;

/** A refund Gripline made (or found already recorded from the provider's webhook). */
export const refundSchema = z.strictObject({
  id: z.number(),
  paymentId: z.number(),
  amountCents: z.number(),
  at: z.string(),
  providerRefundId: z.string().nullable(),
  /** All refunded on the payment so far, and what is left. */
  refundedCents: z.number(),
  refundableCents: z.number(),
});
export type Refund = z.infer<typeof refundSchema>;
