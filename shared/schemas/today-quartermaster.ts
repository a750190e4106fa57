import { z } from 'zod';

/** A bin as home names it: its code (the link), what it holds and its unit. */
const binLine = z.strictObject({ code: z.string(), designation: z.string(), unit: z.string() });
const toolLine = z.strictObject({ code: z.string(), name: z.string() });

const orderLine = binLine.extend({ quantity: z.number(), costCents: z.number() });
const deliveryLine = binLine.extend({
  alertId: z.number(),
  /** Still on its way (ordered less received). */
  quantity: z.number(),
  /** The expected day as entered, "2026-12-08". */
  expectedAt: z.string(),
  /** "expected today", "expected in 3 days", "2 days late". */
  words: z.string(),
});

/** `GET /api/today/quartermaster`: what needs the quartermaster today, each figure from its own screen's function. */
export const quartermasterTodaySchema = z.strictObject({
  /** The purchase list: how many bins, what it costs, the costliest lines. */
  toOrder: z.strictObject({ bins: z.number(), totalCents: z.number(), top: z.array(orderLine) }),
  /** Orders placed (alerts marked ordered): due within the next 7 chapter days, and past their day. */
  deliveries: z.strictObject({ withinDays: z.number(), expected: z.array(deliveryLine), late: z.array(deliveryLine) }),
  /** Tools returned "needs attention" and still out of service. */
  returnsNeedingAttention: z.array(toolLine.extend({ note: z.string(), returnedBy: z.string(), returnedAt: z.string() })),
  /** Accessories that did not come back with a loan, per tool. */
  missingAccessories: z.array(toolLine.extend({ items: z.array(z.strictObject({ accessory: z.string(), lastHolder: z.string() })) })),
  /** Service or calibration overdue or due within `withinDays`, most urgent first. */
  serviceDue: z.strictObject({ withinDays: z.number(), total: z.number(), top: z.array(toolLine.extend({ words: z.string(), overdue: z.boolean() })) }),
  /** Bins suggested for a count today, and the rule that picked them, in a sentence. */
  binsToCount: z.strictObject({
    rule: z.string(),
    bins: z.array(binLine.extend({ lastCountedAt: z.string().nullable(), onHand: z.number(), valueCents: z.number() })),
  }),
  /** Ledger entries that wrote stock off in the last `withinDays` days, newest first. */
  writeOffs: z.strictObject({
    withinDays: z.number(),
    entries: z.array(binLine.extend({ id: z.number(), quantity: z.number(), by: z.string(), at: z.string(), note: z.string() })),
  }),
});
export type QuartermasterToday = z.infer<typeof quartermasterTodaySchema>;
