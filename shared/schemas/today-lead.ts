import { z } from 'zod';
import { overdueLoanSchema } from './overdue';
import { signoffRequestSchema } from './signoff-requests';

/** Home lists at most this many of each; the section's link leads to them all. */
export const LEAD_TODAY_LIST_MAX = 5;

export const holderSummarySchema = z.strictObject({
  id: z.number(),
  name: z.string(),
  toolCount: z.number(),
  /** The due moment of their loan due first, and its state in words ("due tomorrow", "3 days late"). */
  firstDueAt: z.string(),
  firstDueWords: z.string(),
  overdue: z.boolean(),
});
export type HolderSummary = z.infer<typeof holderSummarySchema>;

const spendMonth = z.strictObject({ month: z.string(), consumedCents: z.number() });

/** `GET /api/today/lead`: what needs a chapter lead today. */
export const leadTodaySchema = z.strictObject({
  overdue: z.strictObject({ total: z.number(), loans: z.array(overdueLoanSchema) }),
  onLoan: z.strictObject({ toolCount: z.number(), valueCents: z.number() }),
  holders: z.strictObject({ total: z.number(), people: z.array(holderSummarySchema) }),
  reorder: z.strictObject({ toOrder: z.number() }),
  signoffRequests: z.strictObject({ total: z.number(), requests: z.array(signoffRequestSchema) }),
  /** Consumables used up (the Spend page's figure), this chapter month so far and the whole of last month. */
  spend: z.strictObject({ thisMonth: spendMonth, lastMonth: spendMonth }),
});
export type LeadToday = z.infer<typeof leadTodaySchema>;
