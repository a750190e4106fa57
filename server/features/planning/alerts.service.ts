import type { Alert, AlertState, MarkOrderedBody } from '@shared/schemas/forecast';
import { chapterDay } from '@shared/time/chapter-time';
import { DAY_MS } from '@shared/time/durations';
import type { ServiceContext } from '../../context';
import type { Database } from '../../db/client';
import type { BinRow } from '../../db/schema/stock';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { activeAlertBinIds, findAlert, insertOpenAlerts, listAlerts, recentDismissals, updateAlertFrom, type AlertWithBin, type NewAlertRow } from './alerts.repo';
import { binBrief } from './bin-brief';
import { forecastBins } from './forecast.service';

/** An expected day is stored by its name, at the UTC midnight of "2026-12-09". */
const dayName = (d: Date) => chapterDay(d, 'UTC');
const iso = (d: Date | null) => (d ? d.toISOString() : null);

export function toAlertDto({ alert: a, bin, orderedByName }: AlertWithBin): Alert {
  return {
    id: a.id,
    state: a.state,
    bin: binBrief(bin),
    raisedAt: a.raisedAt.toISOString(),
    reason: a.reason,
    onHandAtRaise: a.onHandAtRaise,
    reorderPoint: a.reorderPoint,
    safetyStock: a.safetyStock,
    suggestedQty: a.suggestedQty,
    orderedAt: iso(a.orderedAt),
    orderedBy: a.orderedById !== null ? { id: a.orderedById, name: orderedByName ?? '' } : null,
    orderedQty: a.orderedQty,
    // The day the quartermaster was told, as entered (YYYY-MM-DD).
    expectedAt: a.expectedAt ? dayName(a.expectedAt) : null,
    closedAt: iso(a.closedAt),
    dismissedAt: iso(a.dismissedAt),
    dismissReason: a.dismissReason,
  };
}

/** When alerts were last refreshed, per database: kept in memory, so a restarted server refreshes on its first look. */
const lastRefresh = new WeakMap<Database, number>();
export const REFRESH_AFTER_MS = 5 * 60_000;
/** A dismissed alert keeps its bin quiet this long, unless on hand falls below what it was raised at. */
export const DISMISSAL_QUIET_MS = 14 * DAY_MS;

/**
 * Raises an open alert for every bin whose forecast calls for one and that has no open or ordered
 * alert yet. The partial unique index keeps it to one active alert per bin even when two refreshes
 * race. After a dismissal the bin stays quiet for 14 days unless its on hand drops below the
 * level that alert was raised at (the quartermaster's reason holds until things get worse). Runs in the daily job, on POST /api/alerts/refresh, and when a quartermaster opens the
 * alerts and the last refresh is over 5 minutes old.
 */
export function refreshAlerts(ctx: ServiceContext): { raised: number[] } {
  const run = forecastBins(ctx);
  const raisedAt = ctx.now();
  const raised = ctx.db.transaction((tx) => {
    const active = activeAlertBinIds(tx);
    const dismissed = recentDismissals(tx, new Date(raisedAt.getTime() - DISMISSAL_QUIET_MS));
    const quiet = (bin: BinRow) => bin.onHand >= (dismissed.get(bin.id) ?? Infinity);
    const rows = run.plans
      .filter(({ bin, forecast }) => forecast.needsAlert && !active.has(bin.id) && !quiet(bin))
      .map(
        ({ bin, forecast: f }): NewAlertRow => ({
          binId: bin.id,
          state: 'open',
          raisedAt,
          reason: f.reason,
          onHandAtRaise: bin.onHand,
          reorderPoint: f.reorderPoint,
          safetyStock: f.safetyStock,
          // An alert always asks for something: at least one pack.
          suggestedQty: Math.max(f.suggestedOrder, bin.packSize),
        }),
      );
    return insertOpenAlerts(tx, rows);
  });
  lastRefresh.set(ctx.db, raisedAt.getTime());
  return { raised };
}

export function refreshIfStale(ctx: ServiceContext): void {
  const last = lastRefresh.get(ctx.db);
  if (last === undefined || ctx.now().getTime() - last > REFRESH_AFTER_MS) refreshAlerts(ctx);
}

const STATES: Record<string, AlertState[] | null> = { active: ['open', 'ordered'], all: null };

export function listAlertsIn(ctx: ServiceContext, state: AlertState | 'active' | 'all'): Alert[] {
  const states = state in STATES ? STATES[state]! : [state as AlertState];
  return listAlerts(ctx.db, states).map(toAlertDto);
}

function alertOrThrow(ctx: ServiceContext, id: number): AlertWithBin {
  const found = findAlert(ctx.db, id);
  if (!found) throw new HttpError(404, 'ALERT_NOT_FOUND', `There is no reorder alert ${id}.`);
  return found;
}

const STATE_WORDS: Record<AlertState, string> = { open: 'still to order', ordered: 'already ordered', closed: 'closed by a receipt', dismissed: 'dismissed' };

/** open → ordered: the quantity and expected day then count as an expected receipt in the forecast. */
export function markOrdered(ctx: ServiceContext, actor: UserRow, id: number, body: MarkOrderedBody): Alert {
  const found = alertOrThrow(ctx, id);
  const now = ctx.now();
  if (body.expectedAt < chapterDay(now, readChapterTimeZone(ctx.db))) {
    const message = `The expected day (${body.expectedAt}) is in the past. Enter the day the order should arrive.`;
    throw new HttpError(400, 'VALIDATION_FAILED', message, [{ path: 'expectedAt', message }]);
  }
  // The table has no note column: an order note is kept with the alert's reason.
  const reason = body.note ? `${found.alert.reason}. Order note: ${body.note}` : undefined;
  const moved = updateAlertFrom(ctx.db, id, ['open'], {
    state: 'ordered',
    orderedAt: now,
    orderedById: actor.id,
    orderedQty: body.quantity,
    expectedAt: new Date(`${body.expectedAt}T00:00:00Z`),
    ...(reason && { reason }),
  });
  if (!moved) {
    const state = alertOrThrow(ctx, id).alert.state;
    throw new HttpError(409, 'ALERT_NOT_OPEN', `The alert for ${found.bin.code} is ${STATE_WORDS[state]}: only an alert still to order can be marked ordered.`);
  }
  return toAlertDto(alertOrThrow(ctx, id));
}

/** open or ordered → dismissed, with the reason in words. */
export function dismissAlert(ctx: ServiceContext, actor: UserRow, id: number, reason: string): Alert {
  const found = alertOrThrow(ctx, id);
  const moved = updateAlertFrom(ctx.db, id, ['open', 'ordered'], { state: 'dismissed', dismissedAt: ctx.now(), dismissedById: actor.id, dismissReason: reason });
  if (!moved) {
    const state = alertOrThrow(ctx, id).alert.state;
    throw new HttpError(409, 'ALERT_NOT_ACTIVE', `The alert for ${found.bin.code} is ${STATE_WORDS[state]}: only an open or ordered alert can be dismissed.`);
  }
  return toAlertDto(alertOrThrow(ctx, id));
}
