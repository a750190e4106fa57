import { and, desc, eq, gte, inArray, min } from 'drizzle-orm';
import type { AlertState } from '@shared/schemas/forecast';
import type { Executor } from '../../db/client';
import { activePeopleWithRole } from '../../jobs/job-runs.repo';
import { binAlerts, type BinAlertRow } from '../../db/schema/builds';
import { bins, type BinRow } from '../../db/schema/stock';
import { users } from '../../db/schema/users';

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

export function findAlert(db: Executor, id: number): AlertWithBin | undefined {
  return withBin(db).where(eq(binAlerts.id, id)).get();
}

/** The active (open or ordered) alert of each bin that has one: bin id → alert id. */
export function activeAlertBinIds(db: Executor): Map<number, number> {
  const rows = db.select({ binId: binAlerts.binId, id: binAlerts.id }).from(binAlerts).where(inArray(binAlerts.state, ACTIVE)).all();
  return new Map(rows.map((r) => [r.binId, r.id]));
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
