import { z } from 'zod';
import { centsWords } from '../stock/money';
import { dollarsAndCentsField, idParam } from './fields';
import { PAYMENT_METHODS } from './payment-methods';

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

// ---- The chapter's payment settings ----

/** Currencies a chapter may ask payments in: ISO 4217 codes in lower case, as the provider takes them. */
export const PAYMENT_CURRENCIES = ['usd', 'cad', 'eur', 'gbp', 'aud', 'nzd'] as const;
export type PaymentCurrency = (typeof PAYMENT_CURRENCIES)[number];

export const CURRENCY_NAMES: Record<PaymentCurrency, string> = {
  usd: 'US dollars',
  cad: 'Canadian dollars',
  eur: 'euros',
  gbp: 'pounds sterling',
  aud: 'Australian dollars',
  nzd: 'New Zealand dollars',
};

export const paymentCurrencySchema = z.enum(PAYMENT_CURRENCIES, { error: `Choose one of ${PAYMENT_CURRENCIES.join(', ')}.` });

/** Replaces both settings at once (PUT). */
export const updatePaymentSettingsBodySchema = z.strictObject({
  offered: z.boolean({ error: 'Say whether online payment is offered: true or false.' }),
  currency: paymentCurrencySchema,
});
export type UpdatePaymentSettingsBody = z.infer<typeof updatePaymentSettingsBodySchema>;

/** Whether the chapter reaches the real provider with its own keys, or the local stand-in. */
export const PAYMENT_PROVIDER_CONNECTIONS = ['local-fake', 'connected'] as const;

export const paymentSettingsSchema = z.strictObject({
  offered: z.boolean(),
  currency: paymentCurrencySchema,
  minimumCents: z.number(),
  provider: z.enum(PAYMENT_PROVIDER_CONNECTIONS),
});
export type PaymentSettingsView = z.infer<typeof paymentSettingsSchema>;

// ---- A checkout's state, for the member coming back from the hosted page ----

/** open: started; paid: the completion was recorded; refused: its amount did not match; expired: replaced or timed out. */
export const ONLINE_PAYMENT_STATES = ['open', 'paid', 'refused', 'expired'] as const;
export type OnlinePaymentState = (typeof ONLINE_PAYMENT_STATES)[number];

export const checkoutSessionParams = z.object({
  sessionId: z
    .string()
    .max(255, { error: 'That is not a checkout id.' })
    .regex(/^\w+$/, { error: 'That is not a checkout id.' }),
});

export const checkoutStatusSchema = z.strictObject({
  state: z.enum(ONLINE_PAYMENT_STATES),
  amountCents: z.number(),
  currency: paymentCurrencySchema,
});
export type CheckoutStatus = z.infer<typeof checkoutStatusSchema>;

// ---- My tab's pay form ----

/** "Pay part": dollars and cents typed by the member, at least the online minimum and at most the balance. */
export const payPartFormSchema = (balanceCents: number, currency: PaymentCurrency) =>
  z.object({
    amount: dollarsAndCentsField('Enter the amount to pay.').pipe(
      z
        .number()
        .min(MIN_ONLINE_PAYMENT_CENTS, { error: `Online payments are at least ${centsWords(MIN_ONLINE_PAYMENT_CENTS, currency)}.` })
        .max(balanceCents, { error: `You owe ${centsWords(balanceCents, currency)}; pay that much or less.` }),
    ),
  });
// ---- The lead's list of payments, refunds and the CSV export ----

const refundCentsField = z
  .number({ error: 'Enter the amount to refund in cents.' })
  .int({ error: 'Enter the amount in whole cents.' })
  .positive({ error: 'A refund is more than $0.00.' });

/** POST /api/payments/:id/refund: the whole unrefunded amount when amountCents is left out. */
export const refundBodySchema = z.object({ amountCents: refundCentsField.optional() }).strict();
export type RefundBody = z.infer<typeof refundBodySchema>;

/** The refund confirm step: the amount typed in dollars and cents, sent as cents. */
export const refundFormSchema = z.object({ amount: dollarsAndCentsField('Enter the amount to refund.').pipe(refundCentsField) });

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

/**
 * A checkout whose completion was refused because the provider reported another amount or currency
 * than the checkout asked: the provider may hold money that is on no tab, for the lead to settle.
 */
export const refusedCheckoutSchema = z.strictObject({
  id: z.number(),
  member: person,
  askedCents: z.number(),
  currency: z.string(),
  /** What the provider reported; null when it reported none. */
  receivedCents: z.number().nullable(),
  receivedCurrency: z.string().nullable(),
  /** When the completion was refused. */
  at: z.string(),
  sessionId: z.string(),
});
export type RefusedCheckout = z.infer<typeof refusedCheckoutSchema>;
export const refusedCheckoutListSchema = z.strictObject({ data: z.array(refusedCheckoutSchema) });
export type RefusedCheckoutList = z.infer<typeof refusedCheckoutListSchema>;
