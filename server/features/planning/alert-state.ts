import { and, eq, inArray } from 'drizzle-orm';
import type { AlertState } from '@shared/schemas/forecast';
import type { Executor } from '../../db/client';
import { binAlerts, type BinAlertRow } from '../../db/schema/builds';

/**
 * The one writer of a reorder alert's state. Planning raises, orders, closes and dismisses alerts;
 * stock's receipts count against them through the `stock.received` domain event (planning.reactions.ts);
 * all go through here, in the caller's transaction.
 */

export type NewAlertRow = typeof binAlerts.$inferInsert;

export type AlertEvent =
  | { event: 'order'; at: Date; byId: number; quantity: number; expectedAt: Date; reason?: string }
  | { event: 'receive'; at: Date; quantity: number; movementId: number }
  | { event: 'close'; at: Date; byId: number }
  | { event: 'no_longer_needed'; at: Date }
  | { event: 'dismiss'; at: Date; byId: number; reason: string };

type EventOf<K extends AlertEvent['event']> = Extract<AlertEvent, { event: K }>;

interface Transition<K extends AlertEvent['event']> {
  from: AlertState;
  event: K;
  /** Taken only when this holds; the next row for the same state and event is tried otherwise. */
  when?: (alert: BinAlertRow, e: EventOf<K>) => boolean;
  to: AlertState;
  set: (alert: BinAlertRow, e: EventOf<K>) => Partial<NewAlertRow>;
}

const arrived = (a: BinAlertRow, e: EventOf<'receive'>) => a.receivedQty + e.quantity;
const dismissal = (_a: BinAlertRow, e: EventOf<'dismiss'>) => ({ dismissedAt: e.at, dismissedById: e.byId, dismissReason: e.reason });

/** Every allowed move (none → open is `raiseAlerts`). Anything not listed is refused. */
const TRANSITIONS: readonly Transition<AlertEvent['event']>[] = [
  {
    from: 'open',
    event: 'order',
    to: 'ordered',
    set: (a, e: EventOf<'order'>) => ({ orderedAt: e.at, orderedById: e.byId, orderedQty: e.quantity, receivedQty: 0, expectedAt: e.expectedAt, reason: e.reason ?? a.reason }),
  },
  // More ordered on top of an order on its way (the purchase list asked for it): one order, the later day.
  {
    from: 'ordered',
    event: 'order',
    to: 'ordered',
    set: (a, e: EventOf<'order'>) => ({ orderedQty: (a.orderedQty ?? 0) + e.quantity, expectedAt: e.expectedAt, reason: e.reason ?? a.reason }),
  },
  // A delivery nobody marked ordered ends the alert; the next refresh raises a new one if the bin still needs it.
  { from: 'open', event: 'receive', to: 'closed', set: (_a, e: EventOf<'receive'>) => ({ closedAt: e.at, closedByMovementId: e.movementId }) },
  {
    from: 'ordered',
    event: 'receive',
    when: (a, e: EventOf<'receive'>) => arrived(a, e) >= (a.orderedQty ?? 0),
    to: 'closed',
    set: (a, e: EventOf<'receive'>) => ({ receivedQty: arrived(a, e), closedAt: e.at, closedByMovementId: e.movementId }),
  },
  // Part of the order came: the rest stays on order.
  { from: 'ordered', event: 'receive', to: 'ordered', set: (a, e: EventOf<'receive'>) => ({ receivedQty: arrived(a, e) }) },
  // The quartermaster closes an order whose rest will not come.
  { from: 'ordered', event: 'close', to: 'closed', set: (_a, e: EventOf<'close'>) => ({ closedAt: e.at, closedById: e.byId }) },
  // Nobody ordered it and the reorder rule no longer asks for it (a count found stock, demand fell): it ends.
  { from: 'open', event: 'no_longer_needed', to: 'closed', set: (_a, e: EventOf<'no_longer_needed'>) => ({ closedAt: e.at }) },
  { from: 'open', event: 'dismiss', to: 'dismissed', set: dismissal },
  { from: 'ordered', event: 'dismiss', to: 'dismissed', set: dismissal },
] as Transition<AlertEvent['event']>[];

/** The states an event may move an alert from: for refusals in words. */
export const statesAllowing = (event: AlertEvent['event']): AlertState[] => [...new Set(TRANSITIONS.filter((t) => t.event === event).map((t) => t.from))];

/**
 * Applies the event to the alert as read; returns the new state, or null when no transition
 * allows it. The UPDATE is conditional on the state and received quantity read, so a concurrent
 * move makes it return null rather than overwrite.
 */
export function moveAlert(db: Executor, alert: BinAlertRow, e: AlertEvent): AlertState | null {
  const t = TRANSITIONS.find((row) => row.from === alert.state && row.event === e.event && (!row.when || row.when(alert, e)));
  if (!t) return null;
  const changed = db
    .update(binAlerts)
    .set({ ...t.set(alert, e), state: t.to })
    .where(and(eq(binAlerts.id, alert.id), eq(binAlerts.state, alert.state), eq(binAlerts.receivedQty, alert.receivedQty)))
    .returning({ id: binAlerts.id })
    .all();
  return changed.length > 0 ? t.to : null;
}

/** none → open. The partial unique index turns a second active alert for a bin into a no-op. Returns the new ids. */
export function raiseAlerts(db: Executor, rows: Omit<NewAlertRow, 'state' | 'id'>[]): number[] {
  if (rows.length === 0) return [];
  return db
    .insert(binAlerts)
    .values(rows.map((r) => ({ ...r, state: 'open' as const })))
    .onConflictDoNothing()
    .returning({ id: binAlerts.id })
    .all()
    .map((r) => r.id);
}

/** A receipt on a bin counts against its active alert, if it has one. */
export function receiptOnBin(db: Executor, binId: number, e: EventOf<'receive'>): void {
  const active = db
    .select()
    .from(binAlerts)
    .where(and(eq(binAlerts.binId, binId), inArray(binAlerts.state, ['open', 'ordered'])))
    .get();
  if (active) moveAlert(db, active, e);
}
