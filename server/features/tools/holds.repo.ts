import { and, asc, eq, inArray, isNull, lte, or, type SQL } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { holds, tools } from '../../db/schema/tools';
import { users } from '../../db/schema/users';
import type { ToolRow } from './tools.repo';

export type HoldRow = typeof holds.$inferSelect;
type HoldStatus = HoldRow['status'];

/** A queue place or a tool set aside: the holds that still count. */
export const ACTIVE_HOLD_STATUSES = ['waiting', 'offered'] as const satisfies readonly HoldStatus[];

export interface HoldWithPerson {
  hold: HoldRow;
  name: string;
  email: string;
}

/** Holds matching `where`, each with the person it is for. */
const holdsWithPerson = (db: Executor, where: SQL | undefined) =>
  db.select({ hold: holds, name: users.name, email: users.email }).from(holds).innerJoin(users, eq(users.id, holds.userId)).where(where);

/** The first active person waiting for a tool whose hold has begun by `now`: queue order is who asked first. */
export function firstWaitingHold(db: Executor, toolId: number, now: Date): HoldWithPerson | undefined {
  const begun = or(isNull(holds.startsAt), lte(holds.startsAt, now));
  return holdsWithPerson(db, and(eq(holds.toolId, toolId), eq(holds.status, 'waiting'), isNull(users.deactivatedAt), begun))
    .orderBy(asc(holds.createdAt), asc(holds.id))
    .get();
}

/** A tool's holds in the given states, with the person each is for. */
export function holdsOnTool(db: Executor, toolId: number, statuses: readonly HoldStatus[]): HoldWithPerson[] {
  return holdsWithPerson(db, and(eq(holds.toolId, toolId), inArray(holds.status, [...statuses]))).all();
}

/** One person's waiting and offered holds, on every tool. */
export function activeHoldsOfPerson(db: Executor, userId: number): HoldWithPerson[] {
  return holdsWithPerson(db, and(eq(holds.userId, userId), inArray(holds.status, [...ACTIVE_HOLD_STATUSES]))).all();
}

/** Offers whose time to collect ran out by `now`. */
export function lapsedOffers(db: Executor, now: Date): HoldWithPerson[] {
  return holdsWithPerson(db, and(eq(holds.status, 'offered'), lte(holds.offerExpiresAt, now))).all();
}

/** Tools on the shelf with someone whose hold from a later day has begun by `now`. */
export function shelvedToolsWithHoldsBegun(db: Executor, now: Date): ToolRow[] {
  return db
    .selectDistinct({ tool: tools })
    .from(holds)
    .innerJoin(tools, eq(tools.id, holds.toolId))
    .where(and(eq(holds.status, 'waiting'), lte(holds.startsAt, now), eq(tools.status, 'available')))
    .all()
    .map(({ tool }) => tool);
}

export function insertHold(
  db: Executor,
  values: Pick<HoldRow, 'toolId' | 'userId' | 'createdAt'> & Partial<Pick<HoldRow, 'status' | 'offeredAt' | 'offerExpiresAt' | 'startsAt'>>,
): HoldRow {
  return db.insert(holds).values(values).returning().get();
}

/** The tool is set aside for this hold's person until `until`. */
export function markHoldOffered(db: Executor, holdId: number, at: Date, until: Date): void {
  db.update(holds).set({ status: 'offered', offeredAt: at, offerExpiresAt: until }).where(eq(holds.id, holdId)).run();
}

/** The hold ends: left, ended by the crib, or not collected in time. */
export function closeHold(db: Executor, holdId: number, status: 'cancelled' | 'expired', at: Date): void {
  db.update(holds).set({ status, closedAt: at }).where(eq(holds.id, holdId)).run();
}

/** An offer ends without the hold: its person waits again, first in the queue as before. */
export function withdrawOffer(db: Executor, holdId: number): void {
  db.update(holds).set({ status: 'waiting', offeredAt: null, offerExpiresAt: null }).where(eq(holds.id, holdId)).run();
}
