import { z } from 'zod';
import { TOOL_CATEGORIES, TOOL_STATUSES } from '../tools/categories';

/** How many weeks of loans the lead's overview shows, and how long unlent makes a tool idle. */
export const LOAN_STATS_WEEKS = 26;
export const IDLE_AFTER_MONTHS = 6;
export const MOST_USED_COUNT = 10;

const category = z.enum(TOOL_CATEGORIES);

export const loanWeekSchema = z.strictObject({
  /** The chapter day the week starts on (a Monday), "2026-11-30". */
  start: z.string(),
  /** Loans taken out that week, per tool kind in `kinds` (every one of them, 0 included). */
  byKind: z.partialRecord(category, z.number().int().nonnegative()),
  total: z.number().int().nonnegative(),
  /** For each loan, the days of this week it was late by the days-late rule, summed. */
  overdueDays: z.number().int().nonnegative(),
});
export type LoanWeek = z.infer<typeof loanWeekSchema>;

const statsTool = { code: z.string(), name: z.string(), category };

export const mostUsedToolSchema = z.strictObject({
  ...statsTool,
  /** Loans taken out in the weeks shown. */
  loans: z.number().int().positive(),
  /** Chapter days those loans were out: checkout day to return day (or today), at least 1 each. */
  daysOut: z.number().int().positive(),
});
export type MostUsedTool = z.infer<typeof mostUsedToolSchema>;

export const idleToolSchema = z.strictObject({
  ...statsTool,
  status: z.enum(TOOL_STATUSES),
  /** The last checkout, or null for a tool never lent. */
  lastLentAt: z.string().nullable(),
  /** When the tool joined the crib. */
  addedAt: z.string(),
});
export type IdleTool = z.infer<typeof idleToolSchema>;

export const loanStatsSchema = z.strictObject({
  /** The last LOAN_STATS_WEEKS chapter weeks, oldest first, the current (partial) week last. */
  weeks: z.array(loanWeekSchema),
  /** Tool kinds lent in those weeks, in the catalogue's order. */
  kinds: z.array(category),
  /** Up to MOST_USED_COUNT tools by loans in those weeks, then by days out. */
  mostUsed: z.array(mostUsedToolSchema),
  /** Tools on the crib's books (not lost or retired) not lent since `idleSince`, never-lent first, then longest idle. */
  idle: z.array(idleToolSchema),
  idleSince: z.string(),
});
export type LoanStats = z.infer<typeof loanStatsSchema>;
