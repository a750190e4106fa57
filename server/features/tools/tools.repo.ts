import { and, asc, count, eq, inArray, isNull, like, lte, or, sql, type SQL } from 'drizzle-orm';
import type { ToolListQuery } from '@shared/schemas/tools';
import type { Database, Executor } from '../../db/client';
import { pageOf } from '../../db/page-of';
import { preparedPerDatabase } from '../../db/prepared';
import { signoffs } from '../../db/schema/signoffs';
import { holds, loans, photos, tools } from '../../db/schema/tools';
import { users } from '../../db/schema/users';
import type { MissingAccessory } from '@shared/schemas/tools';
import { ACTIVE_HOLD_STATUSES } from './holds.repo';
import { loanStatements } from './loans.repo';
import { openMissingAccessories } from './missing-accessories';

export type ToolRow = typeof tools.$inferSelect;
/** A tool's fields other than its state: the state has one writer, `tool-state.ts`. */
export type NewToolRow = Omit<typeof tools.$inferInsert, 'status' | 'statusNote'>;

/** Every scan starts here, so the lookup is the checkout's own prepared statement. */
export function findToolByCode(db: Database, code: string): ToolRow | undefined {
  return loanStatements(db).toolByCode.get({ code });
}

export function findToolById(db: Executor, id: number): ToolRow | undefined {
  return db.select().from(tools).where(eq(tools.id, id)).get();
}

/** A new tool starts on the shelf (the column's default). */
export function insertTool(db: Executor, values: NewToolRow): ToolRow {
  const { status: _status, statusNote: _note, ...fields } = values as typeof tools.$inferInsert;
  return db.insert(tools).values(fields).returning().get();
}

export function updateTool(db: Executor, id: number, values: Partial<NewToolRow>): ToolRow {
  const { status: _status, statusNote: _note, ...fields } = values as Partial<typeof tools.$inferInsert>;
  return db.update(tools).set(fields).where(eq(tools.id, id)).returning().get();
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
  return pageOf(db, tools, listFilter(q), asc(tools.code), q);
}

export interface ToolExtras {
  loans: Map<number, { id: number; holderId: number; holderName: string; checkedOutAt: Date; dueAt: Date; accessoriesOut: string | null }>;
  holds: Map<number, { waiting: number; offeredTo: { id: number; name: string } | null; offerExpiresAt: Date | null }>;
  signoffNames: Map<number, string>;
  photoIds: Map<number, number[]>;
  missingAccessories: Map<number, MissingAccessory[]>;
}

interface ExtrasRows {
  loans: { id: number; toolId: number; holderId: number; holderName: string; checkedOutAt: Date; dueAt: Date; accessoriesOut: string | null }[];
  holds: { toolId: number; status: string; userId: number; name: string; offerExpiresAt: Date | null }[];
  signoffs: { id: number; name: string }[];
  photos: { id: number; toolId: number }[];
}

const p = sql.placeholder;

/** The same four queries for one tool (a scan opens one), prepared once per database. */
const oneToolStatements = preparedPerDatabase((db) => ({
  loans: db
    .select({ id: loans.id, toolId: loans.toolId, holderId: loans.userId, holderName: users.name, checkedOutAt: loans.checkedOutAt, dueAt: loans.dueAt, accessoriesOut: loans.accessoriesOut })
    .from(loans)
    .innerJoin(users, eq(users.id, loans.userId))
    .where(and(eq(loans.toolId, p('toolId')), isNull(loans.returnedAt)))
    .prepare(),
  holds: db
    .select({ toolId: holds.toolId, status: holds.status, userId: holds.userId, name: users.name, offerExpiresAt: holds.offerExpiresAt })
    .from(holds)
    .innerJoin(users, eq(users.id, holds.userId))
    .where(and(eq(holds.toolId, p('toolId')), inArray(holds.status, [...ACTIVE_HOLD_STATUSES])))
    .prepare(),
  signoffs: db.select({ id: signoffs.id, name: signoffs.name }).from(signoffs).where(eq(signoffs.id, p('signoffId'))).prepare(),
  photos: db.select({ id: photos.id, toolId: photos.toolId }).from(photos).where(eq(photos.toolId, p('toolId'))).orderBy(asc(photos.id)).prepare(),
  activeHold: db
    .select()
    .from(holds)
    .where(and(eq(holds.toolId, p('toolId')), eq(holds.userId, p('userId')), inArray(holds.status, [...ACTIVE_HOLD_STATUSES])))
    .prepare(),
  queuePosition: db
    .select({ n: count() })
    .from(holds)
    .where(and(eq(holds.toolId, p('toolId')), inArray(holds.status, [...ACTIVE_HOLD_STATUSES]), lte(holds.id, p('holdId'))))
    .prepare(),
}));

function oneToolRows(db: Database, row: ToolRow): ExtrasRows {
  const s = oneToolStatements(db);
  const toolId = row.id;
  return {
    loans: s.loans.all({ toolId }),
    holds: s.holds.all({ toolId }),
    signoffs: row.requiredSignoffId !== null ? s.signoffs.all({ signoffId: row.requiredSignoffId }) : [],
    photos: s.photos.all({ toolId }),
  };
}

function pageRows(db: Database, rows: ToolRow[], withPhotos: boolean): ExtrasRows {
  const ids = rows.map((r) => r.id);
  const signoffIds = [...new Set(rows.map((r) => r.requiredSignoffId).filter((id): id is number => id !== null))];
  return {
    loans: db
      .select({ id: loans.id, toolId: loans.toolId, holderId: loans.userId, holderName: users.name, checkedOutAt: loans.checkedOutAt, dueAt: loans.dueAt, accessoriesOut: loans.accessoriesOut })
      .from(loans)
      .innerJoin(users, eq(users.id, loans.userId))
      .where(and(inArray(loans.toolId, ids), isNull(loans.returnedAt)))
      .all(),
    holds: db
      .select({ toolId: holds.toolId, status: holds.status, userId: holds.userId, name: users.name, offerExpiresAt: holds.offerExpiresAt })
      .from(holds)
      .innerJoin(users, eq(users.id, holds.userId))
      .where(and(inArray(holds.toolId, ids), inArray(holds.status, [...ACTIVE_HOLD_STATUSES])))
      .all(),
    signoffs: signoffIds.length > 0 ? db.select({ id: signoffs.id, name: signoffs.name }).from(signoffs).where(inArray(signoffs.id, signoffIds)).all() : [],
    photos: withPhotos ? db.select({ id: photos.id, toolId: photos.toolId }).from(photos).where(inArray(photos.toolId, ids)).orderBy(asc(photos.id)).all() : [],
  };
}

/**
 * Open loans, hold queues, sign-off names and photo ids for a page of tools (or the one scanned), in
 * four queries; `withPhotos: false` skips the photo ids (the offline copy has no use for them).
 */
export function loadToolExtras(db: Database, rows: ToolRow[], { withPhotos = true } = {}): ToolExtras {
  const extras: ToolExtras = { loans: new Map(), holds: new Map(), signoffNames: new Map(), photoIds: new Map(), missingAccessories: new Map() };
  if (rows.length === 0) return extras;
  extras.missingAccessories = openMissingAccessories(db, rows.map((r) => r.id));
  const found = rows.length === 1 ? oneToolRows(db, rows[0]!) : pageRows(db, rows, withPhotos);
  for (const l of found.loans) extras.loans.set(l.toolId, l);
  for (const h of found.holds) {
    const entry = extras.holds.get(h.toolId) ?? { waiting: 0, offeredTo: null, offerExpiresAt: null };
    if (h.status === 'waiting') entry.waiting++;
    else {
      entry.offeredTo = { id: h.userId, name: h.name };
      entry.offerExpiresAt = h.offerExpiresAt;
    }
    extras.holds.set(h.toolId, entry);
  }
  for (const s of found.signoffs) extras.signoffNames.set(s.id, s.name);
  for (const ph of found.photos) extras.photoIds.set(ph.toolId, [...(extras.photoIds.get(ph.toolId) ?? []), ph.id]);
  return extras;
}

export function signoffExists(db: Executor, id: number): boolean {
  return db.select({ id: signoffs.id }).from(signoffs).where(eq(signoffs.id, id)).get() !== undefined;
}

export function openLoanHolderId(db: Executor, toolId: number): number | undefined {
  return db.select({ id: loans.userId }).from(loans).where(and(eq(loans.toolId, toolId), isNull(loans.returnedAt))).get()?.id;
}

/** 1 for the person first in the queue (or the one the tool is held for). */
export function queuePosition(db: Database, toolId: number, holdId: number): number {
  return oneToolStatements(db).queuePosition.get({ toolId, holdId })?.n ?? 0;
}

export function findActiveHold(db: Database, toolId: number, userId: number) {
  return oneToolStatements(db).activeHold.get({ toolId, userId });
}
