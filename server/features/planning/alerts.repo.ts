import { and, asc, desc, eq, gte, inArray, min } from 'drizzle-orm';
import type { AlertState } from '@shared/schemas/forecast';
import type { Executor } from '../../db/client';
import { activePeopleWithRole } from '../../jobs/job-runs.repo';
import { binAlerts, type BinAlertRow } from '../../db/schema/builds';
import { bins, type BinRow } from '../../db/schema/stock';
import { users } from '../../db/schema/users';

export type NewAlertRow = typeof binAlerts.$inferInsert;
export interface AlertWithBin {
  alert: BinAlertRow;
  bin: BinRow;
  orderedByName: string | null;
}

const ACTIVE: AlertState[] = ['open', 'ordered'];

function withBin(db: Executor) {
  return db
    .select({ alert: binAlerts, bin: bins, orderedByName: users.name })
    .from(binAlerts)
    .innerJoin(bins, eq(bins.id, binAlerts.binId))
    .leftJoin(users, eq(users.id, binAlerts.orderedById));
}

/** Alerts in these states (all when null), the newest first. */
export function listAlerts(db: Executor, states: AlertState[] | null): AlertWithBin[] {
  return withBin(db)
    .where(states ? inArray(binAlerts.state, states) : undefined)
    .orderBy(desc(binAlerts.raisedAt), desc(binAlerts.id))
    .all();
}

/** Open alerts by supplier and bin code: the purchase list's order. */
export function openAlertsBySupplier(db: Executor): AlertWithBin[] {
  return withBin(db).where(eq(binAlerts.state, 'open')).orderBy(asc(bins.supplier), asc(bins.code)).all();
}

export function findAlert(db: Executor, id: number): AlertWithBin | undefined {
  return withBin(db).where(eq(binAlerts.id, id)).get();
}

export function activeAlertBinIds(db: Executor): Set<number> {
  const rows = db.select({ binId: binAlerts.binId }).from(binAlerts).where(inArray(binAlerts.state, ACTIVE)).all();
  return new Set(rows.map((r) => r.binId));
}

/** Inserts open alerts; the partial unique index turns a second active alert for a bin into a no-op. Returns the new ids. */
export function insertOpenAlerts(db: Executor, rows: NewAlertRow[]): number[] {
  if (rows.length === 0) return [];
  return db.insert(binAlerts).values(rows).onConflictDoNothing().returning({ id: binAlerts.id }).all().map((r) => r.id);
}

/** Moves an alert on only from the states given: false when it was in none of them (someone else moved it first). */
export function updateAlertFrom(db: Executor, id: number, from: AlertState[], values: Partial<NewAlertRow>): boolean {
  const changed = db
    .update(binAlerts)
    .set(values)
    .where(and(eq(binAlerts.id, id), inArray(binAlerts.state, from)))
    .returning({ id: binAlerts.id })
    .all();
  return changed.length > 0;
}

export const activeQuartermasters = (db: Executor) => activePeopleWithRole(db, 'quartermaster');


/** Bins with an alert dismissed since `since`, each with the lowest on hand such an alert was raised at. */
export function recentDismissals(db: Executor, since: Date): Map<number, number> {
  const rows = db
    .select({ binId: binAlerts.binId, onHand: min(binAlerts.onHandAtRaise) })
    .from(binAlerts)
    .where(and(eq(binAlerts.state, 'dismissed'), gte(binAlerts.dismissedAt, since)))
    .groupBy(binAlerts.binId)
    .all();
  return new Map(rows.map((r) => [r.binId, r.onHand ?? 0]));
}
