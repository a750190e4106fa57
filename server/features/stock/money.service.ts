import { hasRole } from '@shared/roles';
import type { PaymentListItem } from '@shared/schemas/payments';
import type { Payment, RecordPaymentBody, Spend, SpendMonth, Tab, TabEntry, TabSummary } from '@shared/schemas/stock-money';
import { BIN_KINDS, type BinKind } from '@shared/stock/kinds';
import { findUserById } from '../../accounts/users.repo';
import type { ServiceContext } from '../../context';
import type { Executor } from '../../db/client';
import type { MovementRow, NewPaymentRefund } from '../../db/schema/stock';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { binDesignation } from '@shared/stock/fasteners';
import { e4ToDollars, valueCents } from '@shared/stock/money';
import { chapterMonth, chapterMonthStarts } from '@shared/time/chapter-time';
import { namesFor, withNames } from './assembly-names';
import {
  claimRefund,
  insertPayment,
  insertRefund,
  listPayments,
  namesOf,
  paidEntries,
  paymentById,
  paymentsOf,
  refundByProviderId,
  spendEntries,
  tabEntries,
  type PaymentFilter,
  type PaymentRow,
  type TabEntryRow,
} from './money.repo';

const RECENT_ENTRIES = 25;

/**
 * What an entry adds to a member's tab, valued entry by entry at the unit cost it was taken at:
 * a draw (stock out) is a charge, a return or a reversed draw takes its value off again.
 */
const chargeOf = (m: Pick<MovementRow, 'quantity' | 'unitCostE4'>) => -valueCents(m.quantity, m.unitCostE4);

function userOrThrow(ctx: ServiceContext, userId: number, status: 400 | 404): UserRow {
  const user = findUserById(ctx.db, userId);
  if (user) return user;
  const message = `There is no person with id ${userId} in the chapter. Choose someone from the list.`;
  throw new HttpError(status, 'USER_NOT_FOUND', message, status === 400 ? [{ path: 'userId', message: 'Choose someone from the list.' }] : undefined);
}

function paymentDto(r: PaymentRow): Payment {
  return {
    id: r.p.id,
    userId: r.p.userId,
    amountCents: r.p.amountCents,
    at: r.p.at.toISOString(),
    note: r.p.note,
    recordedBy: { id: r.p.recordedById, name: r.recordedByName },
    method: r.p.method,
    refundedCents: r.refundedCents,
  };
}

/** What may still be refunded through the provider: cash is handed back in person, never here. */
const refundableCents = (r: PaymentRow) => (r.p.method === 'online' ? Math.max(0, r.p.amountCents - r.refundedCents) : 0);

/** Paid in less refunded, over the entries given (the one sum for "paid" on every tab). */
const netPaidCents = (entries: { cents: number }[]) => entries.reduce((sum, e) => sum + e.cents, 0);

function entryDto(r: TabEntryRow): Omit<TabEntry, 'assembly'> {
  return {
    id: r.m.id,
    at: r.m.at.toISOString(),
    kind: r.m.kind,
    binCode: r.bin.code,
    designation: binDesignation(r.bin),
    quantity: r.m.quantity,
    unitCost: e4ToDollars(r.m.unitCostE4),
    chargeCents: chargeOf(r.m),
    assemblyId: r.m.assemblyId,
    note: r.m.note,
  };
}

/** A member reads their own tab; the quartermaster and the lead read anyone's. */
export function readTab(ctx: ServiceContext, viewer: UserRow, userId: number): Tab {
  if (viewer.id !== userId && !hasRole(viewer.role, 'quartermaster')) {
    throw new HttpError(403, 'FORBIDDEN', 'You can read your own tab only. The quartermaster or the chapter lead can read anyone’s.');
  }
  const member = viewer.id === userId ? viewer : userOrThrow(ctx, userId, 404);
  const entries = tabEntries(ctx.db, member.id);
  const payments = paymentsOf(ctx.db, member.id);

  const zone = readChapterTimeZone(ctx.db);
  const monthOf = (at: number | Date) => chapterMonth(new Date(at), zone);
  const months = new Map<string, { chargedCents: number; paidCents: number }>();
  const monthRow = (month: string) => months.get(month) ?? months.set(month, { chargedCents: 0, paidCents: 0 }).get(month)!;
  const assemblies = new Map<number | null, { quantity: number; chargedCents: number }>();
  let chargedCents = 0;
  for (const e of entries) {
    const charge = chargeOf(e.m);
    chargedCents += charge;
    monthRow(monthOf(e.countsAt)).chargedCents += charge;
    const a = assemblies.get(e.m.assemblyId) ?? assemblies.set(e.m.assemblyId, { quantity: 0, chargedCents: 0 }).get(e.m.assemblyId)!;
    a.quantity -= e.m.quantity;
    a.chargedCents += charge;
  }
  const paid = paidEntries(ctx.db, member.id);
  const paidCents = netPaidCents(paid);
  for (const p of paid) monthRow(monthOf(p.at)).paidCents += p.cents;

  // Assemblies in id order; stock not tied to one comes last.
  const byAssembly = [...assemblies]
    .filter(([, v]) => v.quantity !== 0 || v.chargedCents !== 0)
    .sort(([a], [b]) => (a ?? Infinity) - (b ?? Infinity))
    .map(([assemblyId, v]) => ({ assemblyId, ...v }));
  const recent = entries.slice(-RECENT_ENTRIES).reverse().map(entryDto);
  const names = namesFor(ctx.db, byAssembly, recent);

  return {
    member: { id: member.id, name: member.name },
    chargedCents,
    paidCents,
    balanceCents: chargedCents - paidCents,
    byMonth: [...months].sort(([a], [b]) => b.localeCompare(a)).map(([month, v]) => ({ month, ...v })),
    byAssembly: withNames(byAssembly, names),
    recent: withNames(recent, names),
    payments: payments.map(paymentDto),
  };
}

/** Everyone with something charged or paid, the largest balance owed first. */
export function listTabs(ctx: ServiceContext): TabSummary[] {
  const charged = new Map<number, number>();
  for (const e of tabEntries(ctx.db)) charged.set(e.m.memberId!, (charged.get(e.m.memberId!) ?? 0) + chargeOf(e.m));
  const paidRows = new Map<number, { cents: number }[]>();
  for (const p of paidEntries(ctx.db)) (paidRows.get(p.userId) ?? paidRows.set(p.userId, []).get(p.userId)!).push(p);
  const paid = new Map([...paidRows].map(([id, rows]) => [id, netPaidCents(rows)]));
  const ids = [...new Set([...charged.keys(), ...paid.keys()])];
  const names = namesOf(ctx.db, ids);
  return ids
    .map((id) => {
      const chargedCents = charged.get(id) ?? 0;
      const paidCents = paid.get(id) ?? 0;
      return { member: { id, name: names.get(id) ?? '' }, chargedCents, paidCents, balanceCents: chargedCents - paidCents };
    })
    .filter((t) => t.chargedCents !== 0 || t.paidCents !== 0)
    .sort((a, b) => b.balanceCents - a.balanceCents || a.member.name.localeCompare(b.member.name));
}

/** The lead or quartermaster records money a member handed over; it comes off their balance. */
export function recordPayment(ctx: ServiceContext, actor: UserRow, body: RecordPaymentBody): Payment {
  const member = userOrThrow(ctx, body.userId, 400);
  const row = insertPayment(ctx.db, { userId: member.id, amountCents: body.amountCents, at: ctx.now(), note: body.note ?? '', recordedById: actor.id });
  return paymentDto(paymentById(ctx.db, row.id)!);
}

/** What a member still owes: everything drawn onto the tab less everything paid (negative when paid ahead). */
export function tabBalanceCents(db: Executor, userId: number): number {
  const charged = tabEntries(db, userId).reduce((sum, e) => sum + chargeOf(e.m), 0);
  return charged - netPaidCents(paidEntries(db, userId));
}

/** A payment the member made online comes off their tab like cash, recorded in their own name, in the caller's transaction. */
export function recordOnlinePayment(db: Executor, userId: number, amountCents: number, at: Date, note: string): number {
  return insertPayment(db, { userId, amountCents, at, note, recordedById: userId, method: 'online' }).id;
}

function paymentListItem(r: PaymentRow): PaymentListItem {
  return {
    id: r.p.id,
    member: { id: r.p.userId, name: r.memberName },
    amountCents: r.p.amountCents,
    method: r.p.method,
    refundedCents: r.refundedCents,
    refundableCents: refundableCents(r),
    at: r.p.at.toISOString(),
    recordedBy: { id: r.p.recordedById, name: r.recordedByName },
    note: r.p.note,
  };
}

/** Every payment on the tabs, cash and online, newest first, with what was refunded and what is left. */
export function listTabPayments(db: Executor, filter: PaymentFilter): PaymentListItem[] {
  return listPayments(db, filter).map(paymentListItem);
}

/** One payment on a tab as the refund step needs it; undefined when there is no such payment. */
export function tabPayment(db: Executor, id: number): PaymentListItem | undefined {
  const row = paymentById(db, id);
  return row && paymentListItem(row);
}

/**
 * Records money handed back on a payment, in the caller's transaction: the member's balance goes
 * up by it. Once per provider refund: when it is already recorded (the provider's webhook came
 * first), nothing is added and the person who made it is filled in.
 */
export function recordRefund(db: Executor, entry: NewPaymentRefund): void {
  if (insertRefund(db, entry)) return;
  const existing = refundByProviderId(db, entry.providerRefundId)!;
  if (entry.recordedById != null && existing.recordedById === null) claimRefund(db, existing.id, entry.recordedById, entry.note ?? '');
}

const noKinds = () => Object.fromEntries(BIN_KINDS.map((k) => [k, 0])) as Record<BinKind, number>;

/**
 * The chapter's consumables by month: what was used up (draws and write-offs, less returns) by
 * bin kind, what was bought in, and count adjustments apart (shrinkage is a loss, not spend).
 * Every month in the window is present, empty ones included, oldest first.
 */
export function chapterSpend(ctx: ServiceContext, monthCount: number): Spend {
  const zone = readChapterTimeZone(ctx.db);
  const monthOf = (at: number | Date) => chapterMonth(new Date(at), zone);
  const starts = chapterMonthStarts(ctx.now(), monthCount, zone);
  const months = new Map<string, SpendMonth>(
    starts.map((d) => [monthOf(d), { month: monthOf(d), consumedCents: 0, byKind: noKinds(), purchasedCents: 0, countAdjustmentCents: 0 }]),
  );
  for (const e of spendEntries(ctx.db, starts[0]!)) {
    const row = months.get(monthOf(e.countsAt));
    if (!row) continue;
    const value = valueCents(e.quantity, e.unitCostE4);
    switch (e.countsAs) {
      case 'draw':
      case 'return_unused':
      case 'write_off':
        row.consumedCents -= value;
        row.byKind[e.binKind] -= value;
        break;
      case 'receive':
        row.purchasedCents += value;
        break;
      case 'count':
        row.countAdjustmentCents += value;
        break;
    }
  }
  return { months: [...months.values()] };
}
