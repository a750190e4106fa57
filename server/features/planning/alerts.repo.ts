import { and, desc, eq, gte, inArray, min, type SQL } from 'drizzle-orm';
import type { AlertState } from '@shared/schemas/forecast';
import type { Executor } from '../../db/client';
import { activePeopleWithRole } from '../../jobs/job-runs.repo';
import { binAlerts, type BinAlertRow } from '../../db/schema/builds';
import { users } from '../../db/schema/users';
import { binsWithIds, type BinRow } from '../stock/stock.reads';

export interface AlertWithBin {
  alert: BinAlertRow;
  bin: BinRow;
  orderedByName: string | null;
}

const ACTIVE: AlertState[] = ['open', 'ordered'];

/** The alerts that match, newest first, each with its bin (read from stock in one query) and who ordered it. */
function alertsWithBins(db: Executor, where: SQL | undefined): AlertWithBin[] {
  const rows = db
    .select({ alert: binAlerts, orderedByName: users.name })
    .from(binAlerts)
    .leftJoin(users, eq(users.id, binAlerts.orderedById))
    .where(where)
    .orderBy(desc(binAlerts.raisedAt), desc(binAlerts.id))
    .all();
  const bins = binsWithIds(db, rows.map((r) => r.alert.binId));
  return rows.flatMap(({ alert, orderedByName }) => {
    const bin = bins.get(alert.binId);
    return bin ? [{ alert, bin, orderedByName }] : [];
  });
}

/** Alerts in these states (all when null), the newest first. */
export function listAlerts(db: Executor, states: AlertState[] | null): AlertWithBin[] {
  return alertsWithBins(db, states ? inArray(binAlerts.state, states) : undefined);
}

export function findAlert(db: Executor, id: number): AlertWithBin | undefined {
  return alertsWithBins(db, eq(binAlerts.id, id))[0];
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
