import { and, eq, isNull, sql } from 'drizzle-orm';
import type { Database, Executor } from '../../db/client';
import { preparedPerDatabase } from '../../db/prepared';
import { memberSignoffs, signoffs } from '../../db/schema/signoffs';
import { holds, loans, missingAccessories, tools } from '../../db/schema/tools';
import { users } from '../../db/schema/users';

const p = sql.placeholder;

/**
 * The checkout and return statements, prepared once per database: Drizzle's query builder would
 * rebuild the SQL on every call, and these run on every scan at the bench.
 */
function prepareLoanStatements(db: Database) {
  return {
    toolByCode: db.select().from(tools).where(eq(tools.code, p('code'))).prepare(),
    openLoan: db
      .select({ id: loans.id, userId: loans.userId, holderName: users.name, checkedOutAt: loans.checkedOutAt, dueAt: loans.dueAt, accessoriesOut: loans.accessoriesOut })
      .from(loans)
      .innerJoin(users, eq(users.id, loans.userId))
      .where(and(eq(loans.toolId, p('toolId')), isNull(loans.returnedAt)))
      .prepare(),
    hasSignoff: db
      .select({ id: memberSignoffs.id })
      .from(memberSignoffs)
      .where(and(eq(memberSignoffs.signoffId, p('signoffId')), eq(memberSignoffs.userId, p('userId')), isNull(memberSignoffs.revokedAt)))
      .prepare(),
    openMissing: db
      .select({ accessory: missingAccessories.accessory })
      .from(missingAccessories)
      .where(and(eq(missingAccessories.toolId, p('toolId')), isNull(missingAccessories.resolvedAt)))
      .prepare(),
    signoffName: db.select({ name: signoffs.name }).from(signoffs).where(eq(signoffs.id, p('id'))).prepare(),
    offeredHold: db
      .select({ id: holds.id, userId: holds.userId, offerExpiresAt: holds.offerExpiresAt, name: users.name })
      .from(holds)
      .innerJoin(users, eq(users.id, holds.userId))
      .where(and(eq(holds.toolId, p('toolId')), eq(holds.status, 'offered')))
      .prepare(),
    /** Every return asks whether anyone waits; the queue is usually empty, so the offer's own query runs only when someone does. */
    anyoneWaiting: db
      .select({ id: holds.id })
      .from(holds)
      .where(and(eq(holds.toolId, p('toolId')), eq(holds.status, 'waiting')))
      .limit(1)
      .prepare(),
    insertLoan: db
      .insert(loans)
      .values({ toolId: p('toolId'), userId: p('userId'), checkedOutAt: p('checkedOutAt'), dueAt: p('dueAt'), checkoutArrivedAt: p('arrivedAt'), accessoriesOut: p('accessoriesOut') })
      .returning({ id: loans.id })
      .prepare(),
    fulfilHold: db
      .update(holds)
      .set({ status: 'fulfilled', closedAt: sql`${p('at')}` })
      .where(eq(holds.id, p('holdId')))
      .prepare(),
    closeLoan: db
      .update(loans)
      .set({
        returnedAt: sql`${p('returnedAt')}`,
        returnArrivedAt: sql`${p('arrivedAt')}`,
        returnedById: sql`${p('returnedById')}`,
        returnCondition: sql`${p('condition')}`,
        returnNote: sql`${p('note')}`,
        returnedCount: sql`${p('returnedCount')}`,
        shortfall: sql`${p('shortfall')}`,
        returnPhotoId: sql`${p('returnPhotoId')}`,
      })
      .where(and(eq(loans.id, p('loanId')), isNull(loans.returnedAt)))
      .prepare(),
  };
}

export type LoanStatements = ReturnType<typeof prepareLoanStatements>;
export const loanStatements: (db: Database) => LoanStatements = preparedPerDatabase(prepareLoanStatements);

/** A tool marked lost while on loan: its open loan closes with the reason, so the record says who had it last. */
export function closeLoanOfLostTool(db: Executor, toolId: number, at: Date, actorId: number, note: string): void {
  db.update(loans)
    .set({ returnedAt: at, returnedById: actorId, returnCondition: 'needs_attention', returnNote: `Marked lost: ${note}` })
    .where(and(eq(loans.toolId, toolId), isNull(loans.returnedAt)))
    .run();
}
