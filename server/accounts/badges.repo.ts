import { and, asc, eq, isNull } from 'drizzle-orm';
import type { Executor } from '../db/client';
import { badges, type BadgeRow } from '../db/schema/badges';
import { users, type UserRow } from '../db/schema/users';

/**
 * Gives the person a new badge (its token's hash) and revokes the one they had, in the caller's
 * transaction: a reprinted badge makes the old one stop working.
 */
export function replaceBadge(db: Executor, values: { userId: number; tokenHash: string; issuedById: number; at: Date }): BadgeRow {
  db.update(badges)
    .set({ revokedAt: values.at })
    .where(and(eq(badges.userId, values.userId), isNull(badges.revokedAt)))
    .run();
  return db.insert(badges).values({ userId: values.userId, tokenHash: values.tokenHash, issuedById: values.issuedById, issuedAt: values.at }).returning().get();
}

/** The working badge with this token hash and its holder; undefined when revoked, unknown or the holder is deactivated. */
export function findWorkingBadge(db: Executor, tokenHash: string): { badge: BadgeRow; user: UserRow } | undefined {
  return db
    .select({ badge: badges, user: users })
    .from(badges)
    .innerJoin(users, eq(users.id, badges.userId))
    .where(and(eq(badges.tokenHash, tokenHash), isNull(badges.revokedAt), isNull(users.deactivatedAt)))
    .get();
}

/** The person's working badge, if they have one. */
export function workingBadgeOf(db: Executor, userId: number): BadgeRow | undefined {
  return db
    .select()
    .from(badges)
    .where(and(eq(badges.userId, userId), isNull(badges.revokedAt)))
    .get();
}

/** The ids of everyone holding a working badge. */
export function badgeHolderIds(db: Executor): Set<number> {
  const rows = db.select({ userId: badges.userId }).from(badges).where(isNull(badges.revokedAt)).all();
  return new Set(rows.map((r) => r.userId));
}

/** A person holding a working badge, as a station's offline copy keeps them (no e-mail). */
export interface BadgeHolder {
  userId: number;
  name: string;
  role: UserRow['role'];
  badgeHash: string;
  pinHash: string | null;
}

/** Every active person with a working badge, by name: one query. */
export function workingBadgeHolders(db: Executor): BadgeHolder[] {
  return db
    .select({ userId: users.id, name: users.name, role: users.role, badgeHash: badges.tokenHash, pinHash: users.pinHash })
    .from(badges)
    .innerJoin(users, eq(users.id, badges.userId))
    .where(and(isNull(badges.revokedAt), isNull(users.deactivatedAt)))
    .orderBy(asc(users.name), asc(users.id))
    .all();
}
