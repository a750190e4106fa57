import { and, asc, count, desc, eq, isNull, sql, type SQL } from 'drizzle-orm';
import type { Loan } from '@shared/schemas/tools';
import type { Executor } from '../../db/client';
import { loans, tools } from '../../db/schema/tools';
import { users } from '../../db/schema/users';
import { accessoryList, missingPerLoan } from './missing-accessories';

/** Loans with their tool and holder: open ones soonest due first, returned ones newest first. */
export function listLoans(db: Executor, filter: { userId?: number; open?: boolean }, limit = 500): Loan[] {
  const found = loanRows(db, filter, limit);
  const missing = missingPerLoan(db, found.map((r) => r.loan.id));
  return found.map(({ loan, tool, holderName }) => ({
    id: loan.id,
    tool: { ...tool, accessories: JSON.parse(tool.accessories) as string[] },
    holder: { id: loan.userId, name: holderName },
    checkedOutAt: loan.checkedOutAt.toISOString(),
    dueAt: loan.dueAt.toISOString(),
    returnedAt: loan.returnedAt?.toISOString() ?? null,
    returnCondition: loan.returnCondition,
    returnNote: loan.returnNote,
    returnedCount: loan.returnedCount,
    shortfall: loan.shortfall,
    returnPhotoId: loan.returnPhotoId,
    accessoriesOut: accessoryList(loan.accessoriesOut),
    accessoriesMissing: missing.get(loan.id) ?? [],
    checkoutRecordedAt: loan.checkoutArrivedAt?.toISOString() ?? null,
    returnRecordedAt: loan.returnArrivedAt?.toISOString() ?? null,
  }));
}

function loanRows(db: Executor, filter: { userId?: number; open?: boolean }, limit: number) {
  const parts: SQL[] = [];
  if (filter.userId !== undefined) parts.push(eq(loans.userId, filter.userId));
  if (filter.open) parts.push(isNull(loans.returnedAt));
  return db
    .select({ loan: loans, tool: { id: tools.id, code: tools.code, name: tools.name, category: tools.category, accessories: tools.accessories }, holderName: users.name })
    .from(loans)
    .innerJoin(tools, eq(tools.id, loans.toolId))
    .innerJoin(users, eq(users.id, loans.userId))
    .where(and(...parts))
    .orderBy(desc(isNull(loans.returnedAt)), asc(loans.dueAt), desc(loans.returnedAt))
    .limit(limit)
    .all();
}

/** Tools out on loan now and what they would cost to replace, summed from each tool's replacement value. */
export function openLoanValue(db: Executor): { toolCount: number; valueCents: number } {
  const row = db
    .select({ toolCount: count(), valueCents: sql<number>`coalesce(sum(${tools.replacementValueCents}), 0)` })
    .from(loans)
    .innerJoin(tools, eq(tools.id, loans.toolId))
    .where(isNull(loans.returnedAt))
    .get();
  return { toolCount: row?.toolCount ?? 0, valueCents: Number(row?.valueCents ?? 0) };
}
