import { IDLE_AFTER_MONTHS, LOAN_STATS_WEEKS, MOST_USED_COUNT, type LoanStats, type LoanWeek, type MostUsedTool } from '@shared/schemas/loan-stats';
import { addChapterDays, addChapterMonths, chapterDay, chapterDaysBetween, chapterWeekStarts, daysLate, startOfChapterDay } from '@shared/time/chapter-time';
import { TOOL_CATEGORIES, type ToolCategory } from '@shared/tools/categories';
import type { ServiceContext } from '../../context';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { loansTouching, toolsUnlentSince, type StatsLoanRow } from './loan-stats.repo';

/**
 * The days a loan was late, each as the first instant of that chapter day: the first day after the due
 * day up to the return day (or today), as many as `daysLate` counts, so the overview adds up to
 * what the Overdue page says of an open loan.
 */
function lateDays(loan: StatsLoanRow, now: Date, zone: string): Date[] {
  const end = loan.returnedAt ?? now;
  if (end.getTime() <= loan.dueAt.getTime()) return [];
  return Array.from({ length: daysLate(loan.dueAt, end, zone) }, (_, i) => startOfChapterDay(addChapterDays(loan.dueAt, i + 1, zone), zone));
}

/** Chapter days a loan was out: checkout day to return day (or today), at least 1. */
const daysOut = (loan: StatsLoanRow, now: Date, zone: string): number => Math.max(1, chapterDaysBetween(loan.checkedOutAt, loan.returnedAt ?? now, zone));

/** Loans per week by tool kind, late days per week, the tools used most and those idle: the lead's overview of the crib. */
export function loanStats(ctx: ServiceContext): LoanStats {
  const now = ctx.now();
  const zone = readChapterTimeZone(ctx.db);
  const starts = chapterWeekStarts(now, LOAN_STATS_WEEKS, zone);
  const from = starts[0]!;
  /** Index of the week a moment falls in, or -1 outside the window (before it, or after now). */
  const weekOf = (at: Date) => (at < from || at > now ? -1 : starts.findLastIndex((s) => s <= at));

  const rows = loansTouching(ctx.db, from);
  const counts = starts.map(() => new Map<ToolCategory, number>());
  const overdueDays = starts.map(() => 0);
  const perTool = new Map<string, MostUsedTool>();
  for (const loan of rows) {
    for (const day of lateDays(loan, now, zone)) {
      const w = weekOf(day);
      if (w >= 0) overdueDays[w]! += 1;
    }
    const w = weekOf(loan.checkedOutAt);
    if (w < 0) continue;
    counts[w]!.set(loan.tool.category, (counts[w]!.get(loan.tool.category) ?? 0) + 1);
    const used = perTool.get(loan.tool.code) ?? { ...loan.tool, loans: 0, daysOut: 0 };
    perTool.set(loan.tool.code, { ...used, loans: used.loans + 1, daysOut: used.daysOut + daysOut(loan, now, zone) });
  }

  const kinds = TOOL_CATEGORIES.filter((k) => counts.some((c) => c.has(k)));
  const weeks: LoanWeek[] = starts.map((start, i) => ({
    start: chapterDay(start, zone),
    byKind: Object.fromEntries(kinds.map((k) => [k, counts[i]!.get(k) ?? 0])),
    total: [...counts[i]!.values()].reduce((a, n) => a + n, 0),
    overdueDays: overdueDays[i]!,
  }));
  const mostUsed = [...perTool.values()]
    .sort((a, b) => b.loans - a.loans || b.daysOut - a.daysOut || a.code.localeCompare(b.code))
    .slice(0, MOST_USED_COUNT);

  const idleSince = addChapterMonths(now, -IDLE_AFTER_MONTHS, zone);
  const idle = toolsUnlentSince(ctx.db, idleSince)
    .sort((a, b) => (a.lastLentAt?.getTime() ?? -Infinity) - (b.lastLentAt?.getTime() ?? -Infinity) || a.code.localeCompare(b.code))
    .map((t) => ({ ...t, lastLentAt: t.lastLentAt?.toISOString() ?? null, addedAt: t.addedAt.toISOString() }));

  return { weeks, kinds, mostUsed, idle, idleSince: idleSince.toISOString() };
}
