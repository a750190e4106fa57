import { and, count, desc, eq, gt, gte, isNull } from 'drizzle-orm';
import type { Executor } from '../db/client';
import { accountTokens, type AccountTokenRow } from '../db/schema/account-tokens';
import { users } from '../db/schema/users';

type NewToken = typeof accountTokens.$inferInsert;

export function insertAccountToken(db: Executor, values: NewToken): AccountTokenRow {
  return db.insert(accountTokens).values(values).returning().get();
}

export function findAccountToken(
  db: Executor,
  kind: AccountTokenRow['kind'],
  tokenHash: string,
): AccountTokenRow | undefined {
  return db
    .select()
    .from(accountTokens)
    .where(and(eq(accountTokens.kind, kind), eq(accountTokens.tokenHash, tokenHash)))
    .get();
}

/** How many links of one kind an address was sent since a moment (used, withdrawn or not). */
export function countTokensSince(db: Executor, kind: AccountTokenRow['kind'], email: string, since: Date): number {
  return db
    .select({ n: count() })
    .from(accountTokens)
    .where(and(eq(accountTokens.kind, kind), eq(accountTokens.email, email), gte(accountTokens.createdAt, since)))
    .get()!.n;
}

/** Marks a token used only if nobody used it first; returns false when it lost that race. */
export function claimAccountToken(db: Executor, id: number, at: Date): boolean {
  return (
    db
      .update(accountTokens)
      .set({ usedAt: at })
      .where(and(eq(accountTokens.id, id), isNull(accountTokens.usedAt), isNull(accountTokens.revokedAt)))
      .run().changes === 1
  );
}

/** Revokes the open tokens of one kind for an address (a new invitation replaces the old). */
export function revokeOpenTokens(db: Executor, kind: AccountTokenRow['kind'], email: string, at: Date): void {
  db.update(accountTokens)
    .set({ revokedAt: at })
    .where(
      and(
        eq(accountTokens.kind, kind),
        eq(accountTokens.email, email),
        isNull(accountTokens.usedAt),
        isNull(accountTokens.revokedAt),
      ),
    )
    .run();
}

export function revokeTokenById(db: Executor, id: number, at: Date): boolean {
  return (
    db
      .update(accountTokens)
      .set({ revokedAt: at })
      .where(and(eq(accountTokens.id, id), eq(accountTokens.kind, 'invitation'), isNull(accountTokens.usedAt), isNull(accountTokens.revokedAt)))
      .run().changes === 1
  );
}

export function listOpenInvitations(db: Executor, now: Date) {
  return db
    .select({
      id: accountTokens.id,
      email: accountTokens.email,
      role: accountTokens.role,
      invitedBy: users.name,
      createdAt: accountTokens.createdAt,
      expiresAt: accountTokens.expiresAt,
    })
    .from(accountTokens)
    .leftJoin(users, eq(users.id, accountTokens.createdById))
    .where(
      and(
        eq(accountTokens.kind, 'invitation'),
        isNull(accountTokens.usedAt),
        isNull(accountTokens.revokedAt),
        gt(accountTokens.expiresAt, now),
      ),
    )
    .orderBy(desc(accountTokens.createdAt))
    .all();
}
