import { z } from 'zod';
import { BIN_KINDS, MOVEMENT_KINDS } from '../stock/kinds';
import { assemblyNameSchema } from './bins';
import { dollarsAndCentsField, idParam } from './fields';
import { PAYMENT_METHODS } from './payment-methods';

/** A payment is at most $10,000: a larger figure is almost surely a typing slip. */
export const MAX_PAYMENT_CENTS = 1_000_000;

// ---- Requests ----

const payerField = z.number({ error: 'Choose who paid.' }).int({ error: 'Choose who paid.' }).positive({ error: 'Choose who paid.' });
const amountCentsField = z
  .number({ error: 'Enter the amount paid.' })
  .int({ error: 'Enter the amount in whole cents.' })
  .positive({ error: 'A payment is more than $0.00.' })
  .max(MAX_PAYMENT_CENTS, { error: 'A payment is at most $10,000.00. Record a larger sum as several payments.' });
const paymentNoteField = z.string().trim().max(500, { error: 'Keep the note under 500 characters.' });

export const recordPaymentBodySchema = z.object({ userId: payerField, amountCents: amountCentsField, note: paymentNoteField.optional() }).strict();
export type RecordPaymentBody = z.infer<typeof recordPaymentBodySchema>;

/** The payment form: the amount typed in dollars and cents ("12.50", "$12.50"), sent as cents. */
export const paymentFormSchema = z.object({
  userId: payerField,
  amount: dollarsAndCentsField('Enter the amount paid.').pipe(amountCentsField),
  note: paymentNoteField.optional(),
});

export const tabUserParams = z.object({ userId: idParam });

export const spendQuerySchema = z.object({
  months: z.coerce
    .number({ error: 'months is a number of months, like 12.' })
    .int({ error: 'months is a whole number.' })
    .min(1, { error: 'Ask for at least 1 month.' })
    .max(60, { error: 'Ask for at most 60 months.' })
    .default(12),
});
export type SpendQuery = z.infer<typeof spendQuerySchema>;

// ---- Responses (strict: an extra field fails the contract check) ----

const person = z.strictObject({ id: z.number(), name: z.string() });
/** A UTC calendar month, like 2026-11. */
const month = z.string().regex(/^\d{4}-\d{2}$/);

export const paymentSchema = z.strictObject({
  id: z.number(),
  userId: z.number(),
  amountCents: z.number(),
  at: z.string(),
  note: z.string(),
  recordedBy: person,
  method: z.enum(PAYMENT_METHODS),
  /** What has been handed back on it (online payments, through the provider). */
  refundedCents: z.number(),
});
export type Payment = z.infer<typeof paymentSchema>;

/** One entry on a member's tab: a draw, a return of unused stock, or a reversal of either. */
export const tabEntrySchema = z.strictObject({
  id: z.number(),
  at: z.string(),
  kind: z.enum(MOVEMENT_KINDS),
  binCode: z.string(),
  designation: z.string(),
  /** Signed as the bin moves: a draw is negative. */
  quantity: z.number(),
  unitCost: z.number(),
  /** What the entry adds to the tab: a draw is positive, a return or a reversed draw negative. */
  chargeCents: z.number(),
  assemblyId: z.number().nullable(),
  /** The assembly and build named; null when the entry names no assembly. */
  assembly: assemblyNameSchema.nullable(),
  note: z.string(),
});
export type TabEntry = z.infer<typeof tabEntrySchema>;

export const tabSchema = z.strictObject({
  member: person,
  chargedCents: z.number(),
  /** Paid less refunded. */
  paidCents: z.number(),
  /** charged − paid: what the member still owes (negative when paid ahead). */
  balanceCents: z.number(),
  /** Months with any charge, payment or refund, newest first (a refund counts in its own month, against paid). */
  byMonth: z.array(z.strictObject({ month, chargedCents: z.number(), paidCents: z.number() })),
  /** Net units taken and their value per assembly; null is stock not tied to an assembly. */
  byAssembly: z.array(z.strictObject({ assemblyId: z.number().nullable(), assembly: assemblyNameSchema.nullable(), quantity: z.number(), chargedCents: z.number() })),
  /** The latest tab entries, newest first. */
  recent: z.array(tabEntrySchema),
  payments: z.array(paymentSchema),
});
export type Tab = z.infer<typeof tabSchema>;

export const tabSummarySchema = z.strictObject({ member: person, chargedCents: z.number(), paidCents: z.number(), balanceCents: z.number() });
export type TabSummary = z.infer<typeof tabSummarySchema>;
export const tabListSchema = z.strictObject({ data: z.array(tabSummarySchema) });
export type TabList = z.infer<typeof tabListSchema>;

export const spendMonthSchema = z.strictObject({
  month,
  /** Stock used up: draws and write-offs, less returns, net of reversals. */
  consumedCents: z.number(),
  byKind: z.record(z.enum(BIN_KINDS), z.number()),
  /** Stock bought in: receipts net of their reversals (opening stock of a new bin included). */
  purchasedCents: z.number(),
  /** Value of count adjustments: negative when a count found stock missing (shrinkage). Not spend. */
  countAdjustmentCents: z.number(),
});
export type SpendMonth = z.infer<typeof spendMonthSchema>;
export const spendSchema = z.strictObject({ months: z.array(spendMonthSchema) });
export type Spend = z.infer<typeof spendSchema>;
