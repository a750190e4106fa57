import { and, asc, count, eq, inArray, isNull, ne, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/sqlite-core';
import type { Database, Executor } from '../../db/client';
import { preparedPerDatabase } from '../../db/prepared';
import { memberSignoffs, signoffs } from '../../db/schema/signoffs';
import { tools } from '../../db/schema/tools';
import { users } from '../../db/schema/users';

export type SignoffRow = typeof signoffs.$inferSelect;
export type GrantRow = typeof memberSignoffs.$inferSelect;

const granter = alias(users, 'granter');

export function listSignoffRows(db: Executor): SignoffRow[] {
  return db.select().from(signoffs).orderBy(asc(sql`lower(${signoffs.name})`)).all();
}

export function findSignoff(db: Executor, id: number): SignoffRow | undefined {
  return db.select().from(signoffs).where(eq(signoffs.id, id)).get();
}

/** Names are unique whatever their case, as the database's index says. */
export function findSignoffByName(db: Executor, name: string): SignoffRow | undefined {
  return db.select().from(signoffs).where(eq(sql`lower(${signoffs.name})`, name.toLowerCase())).get();
}

export function insertSignoff(db: Executor, values: { name: string; description: string; createdAt: Date }): SignoffRow {
  return db.insert(signoffs).values(values).returning().get();
}

export function updateSignoff(db: Executor, id: number, values: { name?: string; description?: string }): void {
  db.update(signoffs).set(values).where(eq(signoffs.id, id)).run();
}

/** How many tools still in the crib (not retired) need each sign-off. */
export function countToolsPerSignoff(db: Executor): Map<number, number> {
  const rows = db
    .select({ id: tools.requiredSignoffId, n: count() })
    .from(tools)
    .where(and(ne(tools.status, 'retired'), sql`${tools.requiredSignoffId} is not null`))
    .groupBy(tools.requiredSignoffId)
    .all();
  return new Map(rows.map((r) => [r.id!, r.n]));
}

/** Grants not revoked, with the holder's and the granter's names (of one person, or of several, when asked). */
export function listActiveGrants(db: Executor, filter: { userId?: number; userIds?: readonly number[] } = {}) {
  return db
    .select({
      grantId: memberSignoffs.id,
      signoffId: memberSignoffs.signoffId,
      userId: memberSignoffs.userId,
      holderName: users.name,
      holderDeactivatedAt: users.deactivatedAt,
      grantedAt: memberSignoffs.grantedAt,
      grantedById: memberSignoffs.grantedById,
      grantedByName: granter.name,
    })
    .from(memberSignoffs)
    .innerJoin(users, eq(users.id, memberSignoffs.userId))
    .innerJoin(granter, eq(granter.id, memberSignoffs.grantedById))
    .where(
      and(
        isNull(memberSignoffs.revokedAt),
        filter.userId !== undefined ? eq(memberSignoffs.userId, filter.userId) : undefined,
        filter.userIds !== undefined ? inArray(memberSignoffs.userId, [...filter.userIds]) : undefined,
      ),
    )
    .orderBy(asc(users.name), asc(memberSignoffs.id))
    .all();
}

export function findActiveGrant(db: Executor, signoffId: number, userId: number): GrantRow | undefined {
  return db
    .select()
    .from(memberSignoffs)
    .where(and(eq(memberSignoffs.signoffId, signoffId), eq(memberSignoffs.userId, userId), isNull(memberSignoffs.revokedAt)))
    .get();
}

export function insertGrant(db: Executor, values: { signoffId: number; userId: number; grantedAt: Date; grantedById: number }): GrantRow {
  return db.insert(memberSignoffs).values(values).returning().get();
}

/** Revoking keeps the row: who granted it and who revoked it, and when, stay on record. */
export function markGrantRevoked(db: Executor, grantId: number, at: Date, byId: number): void {
  db.update(memberSignoffs)
    .set({ revokedAt: at, revokedById: byId })
    .where(and(eq(memberSignoffs.id, grantId), isNull(memberSignoffs.revokedAt)))
    .run();
}

const activeLeadsStatement = preparedPerDatabase((db) =>
  db
    .select({ name: users.name })
    .from(users)
    .where(and(eq(users.role, 'lead'), isNull(users.deactivatedAt)))
    .orderBy(asc(users.name))
    .prepare(),
);

/** Named in every "needs a sign-off" answer, a scan's included. */
export function activeLeadNames(db: Database): string[] {
  return activeLeadsStatement(db)
    .all()
    .map((r) => r.name);
}
