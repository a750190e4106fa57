import { asc, eq, sql } from 'drizzle-orm';
import type { Role } from '@shared/roles';
import type { Database, Executor } from '../db/client';
import { preparedPerDatabase } from '../db/prepared';
import { users, type UserRow } from '../db/schema/users';

export function findUserByEmail(db: Executor, email: string): UserRow | undefined {
  return db.select().from(users).where(eq(sql`lower(${users.email})`, email.toLowerCase())).get();
}

export function findUserById(db: Executor, id: number): UserRow | undefined {
  return db.select().from(users).where(eq(users.id, id)).get();
}

const byIdStatement = preparedPerDatabase((db) =>
  db
    .select()
    .from(users)
    .where(eq(users.id, sql.placeholder('id')))
    .prepare(),
);

/** The signed-in person, looked up on every request: the statement is prepared once per database. */
export function loadUserById(db: Database, id: number): UserRow | undefined {
  return byIdStatement(db).get({ id });
}

export function listUsers(db: Executor): UserRow[] {
  return db.select().from(users).orderBy(asc(users.name)).all();
}

export function insertUser(
  db: Executor,
  values: { email: string; name: string; role: Role; passwordHash: string; phone?: string | null; createdAt?: Date },
): UserRow {
  return db.insert(users).values(values).returning().get();
}

/*
 * The writes on a person, one per change a feature may ask for: users are written only here.
 */

/** A lead changes someone's role, or (de)activates them (`deactivatedAt` null is active). */
export function changeAccess(db: Executor, id: number, values: Partial<Pick<UserRow, 'role' | 'deactivatedAt'>>): UserRow | undefined {
  return db.update(users).set(values).where(eq(users.id, id)).returning().get();
}

/** A new password (a reset link was used). */
export function setPasswordHash(db: Executor, id: number, passwordHash: string): void {
  db.update(users).set({ passwordHash }).where(eq(users.id, id)).run();
}

/** The person's crib station PIN, as an argon2id hash; null clears it. */
export function setPinHash(db: Executor, id: number, pinHash: string | null): void {
  db.update(users).set({ pinHash }).where(eq(users.id, id)).run();
}

/** The length unit a person types rivet lines in. */
export function setPreferredUnit(db: Executor, id: number, preferredUnit: UserRow['preferredUnit']): UserRow | undefined {
  return db.update(users).set({ preferredUnit }).where(eq(users.id, id)).returning().get();
}

export function countActiveLeads(db: Executor): number {
  const row = db
    .select({ n: sql<number>`count(*)` })
    .from(users)
    .where(sql`${users.role} = 'lead' and ${users.deactivatedAt} is null`)
    .get();
  return row?.n ?? 0;
}

export function countUsers(db: Executor): number {
  return db.select({ n: sql<number>`count(*)` }).from(users).get()?.n ?? 0;
}
