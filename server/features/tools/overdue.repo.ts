import { and, asc, eq, isNull, lt, max } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { activePeopleWithRole } from '../../jobs/job-runs.repo';
import { loanReminders } from '../../db/schema/crib-jobs';
import { loans, tools } from '../../db/schema/tools';
import { users } from '../../db/schema/users';

export interface OverdueLoanRow {
  loanId: number;
  dueAt: Date;
  returnedAt: Date | null;
  tool: { code: string; name: string; location: string; replacementValueCents: number };
  holder: { id: number; name: string; email: string; phone: string | null };
  lastReminderAt: Date | null;
}

const lastReminder = max(loanReminders.sentAt);

function loanWithPeopleQuery(db: Executor) {
  return db
    .select({
      loanId: loans.id,
      dueAt: loans.dueAt,
      returnedAt: loans.returnedAt,
      tool: { code: tools.code, name: tools.name, location: tools.location, replacementValueCents: tools.replacementValueCents },
      holder: { id: users.id, name: users.name, email: users.email, phone: users.phone },
      lastReminderAt: lastReminder,
    })
    .from(loans)
    .innerJoin(tools, eq(tools.id, loans.toolId))
    .innerJoin(users, eq(users.id, loans.userId))
    .leftJoin(loanReminders, eq(loanReminders.loanId, loans.id));
}

/** Open loans whose due date has passed, the longest overdue first. */
export function listOverdueLoans(db: Executor, now: Date): OverdueLoanRow[] {
  return loanWithPeopleQuery(db)
    .where(and(isNull(loans.returnedAt), lt(loans.dueAt, now)))
    .groupBy(loans.id)
    .orderBy(asc(loans.dueAt), asc(loans.id))
    .all();
}

export function findLoanForReminder(db: Executor, loanId: number): OverdueLoanRow | undefined {
  return loanWithPeopleQuery(db).where(eq(loans.id, loanId)).groupBy(loans.id).get();
}

/** Loans reminded on a given calendar day. */
export function loansRemindedOn(db: Executor, day: string): Set<number> {
  const rows = db.select({ loanId: loanReminders.loanId }).from(loanReminders).where(eq(loanReminders.day, day)).all();
  return new Set(rows.map((r) => r.loanId));
}

/**
 * Claims the day's reminder for a loan. The unique (loanId, day) index decides: true when this
 * call inserted the row (and so must queue the mail), false when one was already sent that day.
 */
export function claimReminder(db: Executor, r: { loanId: number; day: string; sentAt: Date; sentById: number | null }): boolean {
  const inserted = db.insert(loanReminders).values(r).onConflictDoNothing().returning({ id: loanReminders.id }).all();
  return inserted.length > 0;
}

export const activeLeads = (db: Executor) => activePeopleWithRole(db, 'lead');


