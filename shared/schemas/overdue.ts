import { z } from 'zod';
import { dayCount } from '../time/chapter-time';
import { TOOL_CATEGORIES, TOOL_STATUSES, type ToolCategory } from '../tools/categories';
import { idParam } from './fields';

export const loanIdParams = z.object({ loanId: idParam });

/** One run of a scheduled job, as the lead sees it ("last run"). */
export const jobRunSchema = z.strictObject({
  startedAt: z.string(),
  finishedAt: z.string().nullable(),
  summary: z.string(),
  error: z.string().nullable(),
});
export type JobRun = z.infer<typeof jobRunSchema>;

export const overdueLoanSchema = z.strictObject({
  loanId: z.number(),
  tool: z.strictObject({ code: z.string(), name: z.string(), location: z.string(), replacementValueCents: z.number() }),
  holder: z.strictObject({ id: z.number(), name: z.string(), email: z.string(), phone: z.string().nullable() }),
  dueAt: z.string(),
  /** Chapter days from the due day to today (shared/time daysLate); less than a day late counts as 1. */
  daysLate: z.number(),
  lastReminderAt: z.string().nullable(),
  /** A reminder went out on the chapter's calendar day, so no other may go today. */
  remindedToday: z.boolean(),
});
export type OverdueLoan = z.infer<typeof overdueLoanSchema>;

export const overdueListSchema = z.strictObject({ data: z.array(overdueLoanSchema), lastRun: jobRunSchema.nullable() });
export type OverdueList = z.infer<typeof overdueListSchema>;

export const reminderSentSchema = z.strictObject({ loanId: z.number(), sentTo: z.string(), sentAt: z.string(), day: z.string() });
export type ReminderSent = z.infer<typeof reminderSentSchema>;

/** Service and calibration: how close a tool is to needing it, most urgent first. */
export const SERVICE_DUE_WITHIN_DAYS = 14;
export const SERVICE_URGENCIES = ['overdue', 'out_of_service', 'accessory_missing', 'due_soon'] as const;
export type ServiceUrgency = (typeof SERVICE_URGENCIES)[number];

/** Torque wrenches and measuring tools are calibrated; everything else is serviced. */
export function serviceKindOf(category: ToolCategory): 'calibration' | 'service' {
  return category === 'torque_wrench' || category === 'measuring' ? 'calibration' : 'service';
}

export const serviceDueItemSchema = z.strictObject({
  code: z.string(),
  name: z.string(),
  category: z.enum(TOOL_CATEGORIES),
  location: z.string(),
  status: z.enum(TOOL_STATUSES),
  outOfServiceReason: z.string().nullable(),
  serviceKind: z.enum(['calibration', 'service']),
  serviceIntervalDays: z.number().nullable(),
  lastServiceAt: z.string().nullable(),
  serviceDueAt: z.string().nullable(),
  /** Whole days until service is due; negative when overdue; null without an interval. */
  daysUntilDue: z.number().nullable(),
  urgency: z.enum(SERVICE_URGENCIES),
  /** Accessories that did not come back with a loan and are not yet found or replaced. */
  missingAccessories: z.array(z.string()),
  /** The state in words, e.g. "Calibration overdue by 12 days". */
  words: z.string(),
});
export type ServiceDueItem = z.infer<typeof serviceDueItemSchema>;

export const serviceDueListSchema = z.strictObject({ data: z.array(serviceDueItemSchema), meta: z.strictObject({ dueWithinDays: z.number() }) });
export type ServiceDueList = z.infer<typeof serviceDueListSchema>;

/** "Calibration overdue by 12 days", "Service due today", "Calibration due in 5 days". */
export function serviceDueWords(kind: 'calibration' | 'service', daysUntilDue: number): string {
  const what = kind === 'calibration' ? 'Calibration' : 'Service';
  if (daysUntilDue < 0) return `${what} overdue by ${dayCount(-daysUntilDue)}`;
  if (daysUntilDue === 0) return `${what} due today`;
  return `${what} due in ${dayCount(daysUntilDue)}`;
}
