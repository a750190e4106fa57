import { and, desc, eq, gte, notExists, sql } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { loans, toolEvents, tools } from '../../db/schema/tools';
import { users } from '../../db/schema/users';

export interface AttentionReturn {
  loanId: number;
  tool: { code: string; name: string };
  returnedAt: Date;
  /** Who returned it (the one who flagged it; the borrower on a loan from before that was kept). */
  returnedBy: string;
  /** The return's note, else the tool's status note. */
  note: string | null;
}

/**
 * Returns flagged "needs attention" that are still open: the tool is still out of service and has
 * not been put back in service since. `flaggedById`: only those this person returned. The member's
 * home and the quartermaster's both read this one rule.
 */
export function openAttentionReturns(db: Executor, filter: { flaggedById?: number } = {}): AttentionReturn[] {
  const putBackSince = db
    .select({ id: toolEvents.id })
    .from(toolEvents)
    .where(and(eq(toolEvents.toolId, loans.toolId), eq(toolEvents.action, 'back_in_service'), gte(toolEvents.at, loans.returnedAt)));
  return db
    .select({ loan: loans, code: tools.code, name: tools.name, statusNote: tools.statusNote, returnedBy: users.name })
    .from(loans)
    .innerJoin(tools, eq(tools.id, loans.toolId))
    .innerJoin(users, eq(users.id, sql`coalesce(${loans.returnedById}, ${loans.userId})`))
    .where(
      and(
        eq(loans.returnCondition, 'needs_attention'),
        eq(tools.status, 'out_of_service'),
        filter.flaggedById === undefined ? undefined : eq(loans.returnedById, filter.flaggedById),
        notExists(putBackSince),
      ),
    )
    .orderBy(desc(loans.returnedAt))
    .all()
    .map(({ loan, code, name, statusNote, returnedBy }) => ({
      loanId: loan.id,
      tool: { code, name },
      returnedAt: loan.returnedAt!,
      returnedBy,
      note: loan.returnNote ?? statusNote,
    }));
}
