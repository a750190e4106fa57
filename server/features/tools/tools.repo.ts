import { and, asc, count, eq, inArray, isNull, like, lte, or, sql, type SQL } from 'drizzle-orm';
import type { ToolListQuery } from '@shared/schemas/tools';
import type { Executor } from '../../db/client';
import { signoffs } from '../../db/schema/signoffs';
import { holds, loans, photos, tools } from '../../db/schema/tools';
import { users } from '../../db/schema/users';

export type ToolRow = typeof tools.$inferSelect;
export type NewToolRow = typeof tools.$inferInsert;

export function findToolByCode(db: Executor, code: string): ToolRow | undefined {
  return db.select().from(tools).where(eq(tools.code, code)).get();
}

export function insertTool(db: Executor, values: NewToolRow): ToolRow {
  return db.insert(tools).values(values).returning().get();
}

export function updateTool(db: Executor, id: number, values: Partial<NewToolRow>): ToolRow {
  return db.update(tools).set(values).where(eq(tools.id, id)).returning().get();
}

/** The next free label code: one more than the highest T-number in use, four digits at least. */
export function nextToolCode(db: Executor): string {
  const row = db.select({ n: sql<number | null>`max(cast(substr(${tools.code}, 3) as integer))` }).from(tools).get();
  return `T-${String((row?.n ?? 0) + 1).padStart(4, '0')}`;
}

function listFilter(q: ToolListQuery): SQL | undefined {
  const parts: (SQL | undefined)[] = [
    q.status ? eq(tools.status, q.status) : undefined,
    q.category ? eq(tools.category, q.category) : undefined,
    q.location ? eq(tools.location, q.location) : undefined,
    q.q
      ? or(like(tools.name, `%${q.q}%`), like(tools.code, `%${q.q}%`), like(tools.location, `%${q.q}%`), like(tools.notes, `%${q.q}%`))
      : undefined,
  ];
  return and(...parts.filter(Boolean));
}

export function listTools(db: Executor, q: ToolListQuery): { rows: ToolRow[]; total: number } {
  const where = listFilter(q);
  const total = db.select({ n: count() }).from(tools).where(where).get()?.n ?? 0;
  const rows = db
    .select()
    .from(tools)
    .where(where)
    .orderBy(asc(tools.code))
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize)
    .all();
  return { rows, total };
}

export interface ToolExtras {
  loans: Map<number, { id: number; holderId: number; holderName: string; checkedOutAt: Date; dueAt: Date }>;
  holds: Map<number, { waiting: number; offeredTo: { id: number; name: string } | null; offerExpiresAt: Date | null }>;
  signoffNames: Map<number, string>;
  photoIds: Map<number, number[]>;
}

/** Open loans, hold queues, sign-off names and photo ids for a page of tools, in four queries. */
export function loadToolExtras(db: Executor, rows: ToolRow[]): ToolExtras {
  const ids = rows.map((r) => r.id);
  const extras: ToolExtras = { loans: new Map(), holds: new Map(), signoffNames: new Map(), photoIds: new Map() };
  if (ids.length === 0) return extras;
  for (const l of db
    .select({ id: loans.id, toolId: loans.toolId, holderId: loans.userId, holderName: users.name, checkedOutAt: loans.checkedOutAt, dueAt: loans.dueAt })
    .from(loans)
    .innerJoin(users, eq(users.id, loans.userId))
    .where(and(inArray(loans.toolId, ids), sql`${loans.returnedAt} is null`))
    .all()) {
    extras.loans.set(l.toolId, l);
  }
  for (const h of db
    .select({ toolId: holds.toolId, status: holds.status, userId: holds.userId, name: users.name, offerExpiresAt: holds.offerExpiresAt })
    .from(holds)
    .innerJoin(users, eq(users.id, holds.userId))
    .where(and(inArray(holds.toolId, ids), inArray(holds.status, ['waiting', 'offered'])))
    .all()) {
    const entry = extras.holds.get(h.toolId) ?? { waiting: 0, offeredTo: null, offerExpiresAt: null };
    if (h.status === 'waiting') entry.waiting++;
    else {
      entry.offeredTo = { id: h.userId, name: h.name };
      entry.offerExpiresAt = h.offerExpiresAt;
    }
    extras.holds.set(h.toolId, entry);
  }
  const signoffIds = [...new Set(rows.map((r) => r.requiredSignoffId).filter((id): id is number => id !== null))];
  if (signoffIds.length > 0) {
    for (const s of db.select({ id: signoffs.id, name: signoffs.name }).from(signoffs).where(inArray(signoffs.id, signoffIds)).all()) {
      extras.signoffNames.set(s.id, s.name);
    }
  }
  for (const p of db.select({ id: photos.id, toolId: photos.toolId }).from(photos).where(inArray(photos.toolId, ids)).orderBy(asc(photos.id)).all()) {
    extras.photoIds.set(p.toolId, [...(extras.photoIds.get(p.toolId) ?? []), p.id]);
  }
  return extras;
}

export function signoffExists(db: Executor, id: number): boolean {
  return db.select({ id: signoffs.id }).from(signoffs).where(eq(signoffs.id, id)).get() !== undefined;
}

export function openLoanHolderId(db: Executor, toolId: number): number | undefined {
  return db.select({ id: loans.userId }).from(loans).where(and(eq(loans.toolId, toolId), isNull(loans.returnedAt))).get()?.id;
}

/** 1 for the person first in the queue (or the one the tool is held for). */
export function queuePosition(db: Executor, toolId: number, holdId: number): number {
  return (
    db
      .select({ n: count() })
      .from(holds)
      .where(and(eq(holds.toolId, toolId), inArray(holds.status, ['waiting', 'offered']), lte(holds.id, holdId)))
      .get()?.n ?? 0
  );
}

export function findActiveHold(db: Executor, toolId: number, userId: number) {
  return db
    .select()
    .from(holds)
    .where(and(eq(holds.toolId, toolId), eq(holds.userId, userId), inArray(holds.status, ['waiting', 'offered'])))
    .get();
}
