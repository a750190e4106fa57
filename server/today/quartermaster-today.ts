import { serviceDueWords, SERVICE_DUE_WITHIN_DAYS } from '@shared/schemas/overdue';
import type { Alert } from '@shared/schemas/forecast';
import type { QuartermasterToday } from '@shared/schemas/today-quartermaster';
import { chapterDay, chapterDaysBetween, dayCount, daysLateWords } from '@shared/time/chapter-time';
import { DAY_MS } from '@shared/time/durations';
import type { ServiceContext } from '../context';
import { listAlertsIn } from '../features/planning/alerts.service';
import { purchaseList } from '../features/planning/purchase-list';
import { reorderPlan } from '../features/planning/reorder-plan';
import { COUNT_RULE, suggestBinsToCount } from '../features/stock/count-suggestions';
import { recentWriteOffs } from '../features/stock/recent-write-offs';
import { toolsMissingAccessories } from '../features/tools/missing-accessories';
import { openAttentionReturns } from '../features/tools/attention-returns';
import { listServiceDue } from '../features/tools/service-due.service';
import { readChapterTimeZone } from '../settings/chapter-time-zone';

/** Home lists this many of a kind, with a link to the rest. */
const TOP = 5;
export const DELIVERY_WITHIN_DAYS = 7;
export const WRITE_OFF_WITHIN_DAYS = 14;

/** Expected days are day names (UTC midnight labels), so they are compared with today's name in UTC. */
const atMidnight = (day: string) => new Date(`${day}T00:00:00Z`);

function deliveryWords(daysUntil: number): string {
  if (daysUntil < 0) return daysLateWords(-daysUntil);
  if (daysUntil === 0) return 'expected today';
  if (daysUntil === 1) return 'expected tomorrow';
  return `expected in ${dayCount(daysUntil)}`;
}

function deliveries(ctx: ServiceContext, ordered: Alert[]): QuartermasterToday['deliveries'] {
  const today = atMidnight(chapterDay(ctx.now(), readChapterTimeZone(ctx.db)));
  const lines = ordered
    .filter((a) => a.expectedAt !== null && a.onOrder > 0)
    .map((a) => ({ alert: a, daysUntil: chapterDaysBetween(today, atMidnight(a.expectedAt!), 'UTC') }))
    .sort((x, y) => x.daysUntil - y.daysUntil || x.alert.bin.code.localeCompare(y.alert.bin.code))
    .map(({ alert: a, daysUntil }) => ({
      daysUntil,
      line: { alertId: a.id, code: a.bin.code, designation: a.bin.designation, unit: a.bin.unit, quantity: a.onOrder, expectedAt: a.expectedAt!, words: deliveryWords(daysUntil) },
    }));
  return {
    withinDays: DELIVERY_WITHIN_DAYS,
    expected: lines.filter((l) => l.daysUntil >= 0 && l.daysUntil <= DELIVERY_WITHIN_DAYS).map((l) => l.line),
    late: lines.filter((l) => l.daysUntil < 0).map((l) => l.line),
  };
}

function tools(ctx: ServiceContext): Pick<QuartermasterToday, 'returnsNeedingAttention' | 'missingAccessories' | 'serviceDue'> {
  const service = listServiceDue(ctx).data;
  const due = service.filter((t) => t.daysUntilDue !== null && t.daysUntilDue <= SERVICE_DUE_WITHIN_DAYS);
  return {
    returnsNeedingAttention: openAttentionReturns(ctx.db).map((r) => ({ ...r.tool, note: r.note ?? '', returnedBy: r.returnedBy, returnedAt: r.returnedAt.toISOString() })),
    missingAccessories: toolsMissingAccessories(ctx.db).map((t) => ({
      code: t.code,
      name: t.name,
      items: t.missing.map((m) => ({ accessory: m.accessory, lastHolder: m.lastHolder.name })),
    })),
    serviceDue: {
      withinDays: SERVICE_DUE_WITHIN_DAYS,
      total: due.length,
      top: due.slice(0, TOP).map((t) => ({ code: t.code, name: t.name, words: serviceDueWords(t.serviceKind, t.daysUntilDue!), overdue: t.daysUntilDue! < 0 })),
    },
  };
}

/**
 * The quartermaster's day: each part read with the function its own screen uses (the purchase
 * list, the alerts, the Service list, the ledger). A read only: nothing is raised or written.
 */
export function quartermasterToday(ctx: ServiceContext): QuartermasterToday {
  const plan = reorderPlan(ctx);
  const lines = purchaseList(ctx, plan).data.flatMap((g) => g.lines);
  const since = new Date(ctx.now().getTime() - WRITE_OFF_WITHIN_DAYS * DAY_MS);
  return {
    toOrder: {
      bins: lines.length,
      totalCents: lines.reduce((sum, l) => sum + l.costCents, 0),
      top: [...lines]
        .sort((a, b) => b.costCents - a.costCents || a.bin.code.localeCompare(b.bin.code))
        .slice(0, TOP)
        .map((l) => ({ code: l.bin.code, designation: l.bin.designation, unit: l.bin.unit, quantity: l.quantity, costCents: l.costCents })),
    },
    deliveries: deliveries(ctx, listAlertsIn(ctx, 'ordered', plan)),
    ...tools(ctx),
    binsToCount: {
      rule: COUNT_RULE,
      bins: suggestBinsToCount(ctx.db).map((s) => ({
        code: s.bin.code,
        designation: s.designation,
        unit: s.bin.unit,
        onHand: s.bin.onHand,
        valueCents: s.valueCents,
        lastCountedAt: s.lastCountedAt?.toISOString() ?? null,
      })),
    },
    writeOffs: {
      withinDays: WRITE_OFF_WITHIN_DAYS,
      entries: recentWriteOffs(ctx.db, since).slice(0, TOP).map((w) => ({ id: w.id, code: w.binCode, designation: w.designation, unit: w.unit, quantity: w.quantity, by: w.by, at: w.at.toISOString(), note: w.note })),
    },
  };
}
