import type { Alert, AlertState, MarkOrderedBody } from '@shared/schemas/forecast';
import { chapterDay } from '@shared/time/chapter-time';
import type { ServiceContext } from '../../context';
import type { Database, Executor } from '../../db/client';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { moveAlert, raiseAlerts, statesAllowing, type AlertEvent } from './alert-state';
import { activeAlertBinIds, findAlert, listAlerts, type AlertWithBin } from './alerts.repo';
import { binBrief } from './bin-brief';
import { reorderPlan, type PlannedOrder, type ReorderPlan } from './reorder-plan';

/** An expected day is stored by its name, at the UTC midnight of "2026-12-09". */
const dayName = (d: Date) => chapterDay(d, 'UTC');
const iso = (d: Date | null) => (d ? d.toISOString() : null);

/** An alert with what the one reorder rule says now: still to order (0 once closed or dismissed) and still on order. */
export function toAlertDto({ alert: a, bin, orderedByName }: AlertWithBin, now: Pick<PlannedOrder, 'toOrder'> | undefined): Alert {
  const active = a.state === 'open' || a.state === 'ordered';
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
    receivedQty: a.receivedQty,
    onOrder: a.state === 'ordered' ? Math.max(0, (a.orderedQty ?? 0) - a.receivedQty) : 0,
    toOrder: active ? (now?.toOrder ?? 0) : 0,
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

/**
 * Raises an open alert for every bin the one reorder rule orders now (a recent dismissal keeps a
 * bin quiet, see reorder-plan.ts) that has no open or ordered alert yet. The partial unique index
 * keeps it to one active alert per bin even when two refreshes race. Runs in the daily job, on
 * POST /api/alerts/refresh, and in the 5-minute check when the last refresh is over 5 minutes old
 * (never on a GET: reading the alerts writes nothing). Returns the plan it used.
 */
export function refreshAlerts(ctx: ServiceContext): { raised: number[]; plan: ReorderPlan } {
  const plan = reorderPlan(ctx);
  const raisedAt = plan.run.now;
  const raised = ctx.db.transaction((tx) => {
    const active = activeAlertBinIds(tx);
    const rows = [...plan.orders.values()]
      .filter((o) => o.toOrder > 0 && !active.has(o.plan.bin.id))
      .map(({ plan: { bin, forecast: f }, toOrder }) => ({
        binId: bin.id,
        raisedAt,
        reason: f.reason,
        onHandAtRaise: bin.onHand,
        reorderPoint: f.reorderPoint,
        safetyStock: f.safetyStock,
        suggestedQty: toOrder,
      }));
    closeAlertsNoLongerNeeded(tx, plan, raisedAt);
    return raiseAlerts(tx, rows);
  });
  lastRefresh.set(ctx.db, raisedAt.getTime());
  return { raised, plan };
}

/** Open alerts whose bin the reorder rule no longer orders are closed, so none shows "order 0". Ordered ones wait for their delivery. */
function closeAlertsNoLongerNeeded(tx: Executor, plan: ReorderPlan, at: Date): void {
  for (const { alert } of listAlerts(tx, ['open'])) {
    if ((plan.orders.get(alert.binId)?.toOrder ?? 0) === 0) moveAlert(tx, alert, { event: 'no_longer_needed', at });
  }
}

/** The 5-minute check: refreshes when the last refresh is over 5 minutes old; returns the plan it used, if it ran. */
export function refreshIfStale(ctx: ServiceContext): ReorderPlan | undefined {
  const last = lastRefresh.get(ctx.db);
  if (last === undefined || ctx.now().getTime() - last > REFRESH_AFTER_MS) return refreshAlerts(ctx).plan;
  return undefined;
}

const STATES: Record<string, AlertState[] | null> = { active: ['open', 'ordered'], all: null };

export function listAlertsIn(ctx: ServiceContext, state: AlertState | 'active' | 'all', plan: ReorderPlan = reorderPlan(ctx)): Alert[] {
  const states = state in STATES ? STATES[state]! : [state as AlertState];
  return listAlerts(ctx.db, states).map((found) => toAlertDto(found, plan.orders.get(found.bin.id)));
}

function alertDto(ctx: ServiceContext, id: number): Alert {
  const found = alertOrThrow(ctx, id);
  return toAlertDto(found, reorderPlan(ctx).orders.get(found.bin.id));
}

function alertOrThrow(ctx: ServiceContext, id: number): AlertWithBin {
  const found = findAlert(ctx.db, id);
  if (!found) throw new HttpError(404, 'ALERT_NOT_FOUND', `There is no reorder alert ${id}.`);
  return found;
}

const STATE_WORDS: Record<AlertState, string> = { open: 'still to order', ordered: 'already ordered', closed: 'closed', dismissed: 'dismissed' };
const EVENT_WORDS: Record<AlertEvent['event'], string> = { order: 'marked ordered', receive: 'received against', close: 'closed by hand', dismiss: 'dismissed', no_longer_needed: 'closed as no longer needed' };
const REFUSAL_CODES: Record<AlertEvent['event'], string> = { order: 'ALERT_NOT_ACTIVE', receive: 'ALERT_NOT_ACTIVE', close: 'ALERT_NOT_ORDERED', dismiss: 'ALERT_NOT_ACTIVE', no_longer_needed: 'ALERT_NOT_OPEN' };

/** Moves the alert by the event through the one writer, or says in words why it cannot. */
function moveOrRefuse(ctx: ServiceContext, id: number, e: AlertEvent): Alert {
  const found = alertOrThrow(ctx, id);
  if (!moveAlert(ctx.db, found.alert, e)) {
    const state = alertOrThrow(ctx, id).alert.state;
    const allowed = statesAllowing(e.event).map((s) => STATE_WORDS[s]);
    throw new HttpError(
      409,
      REFUSAL_CODES[e.event],
      `The alert for ${found.bin.code} is ${STATE_WORDS[state]}: only an alert ${allowed.join(' or ')} can be ${EVENT_WORDS[e.event]}.`,
    );
  }
  return alertDto(ctx, id);
}

/** open → ordered: the quantity and expected day then count as on order (an expected receipt in the forecast). */
export function markOrdered(ctx: ServiceContext, actor: UserRow, id: number, body: MarkOrderedBody): Alert {
  const found = alertOrThrow(ctx, id);
  const now = ctx.now();
  if (body.expectedAt < chapterDay(now, readChapterTimeZone(ctx.db))) {
    const message = `The expected day (${body.expectedAt}) is in the past. Enter the day the order should arrive.`;
    throw new HttpError(400, 'VALIDATION_FAILED', message, [{ path: 'expectedAt', message }]);
  }
  // The table has no note column: an order note is kept with the alert's reason.
  const reason = body.note ? `${found.alert.reason}. Order note: ${body.note}` : undefined;
  return moveOrRefuse(ctx, id, { event: 'order', at: now, byId: actor.id, quantity: body.quantity, expectedAt: new Date(`${body.expectedAt}T00:00:00Z`), reason });
}

/** ordered → closed by the quartermaster: the rest of the order will not come. */
export function closeAlert(ctx: ServiceContext, actor: UserRow, id: number): Alert {
  return moveOrRefuse(ctx, id, { event: 'close', at: ctx.now(), byId: actor.id });
}

/** open or ordered → dismissed, with the reason in words. */
export function dismissAlert(ctx: ServiceContext, actor: UserRow, id: number, reason: string): Alert {
  return moveOrRefuse(ctx, id, { event: 'dismiss', at: ctx.now(), byId: actor.id, reason });
}
