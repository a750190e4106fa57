import { and, eq, lt } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { idempotencyKeys, type IdempotencyKeyRow } from '../../db/schema/idempotency';

export type NewIdempotencyKey = typeof idempotencyKeys.$inferInsert;

export function findKey(db: Executor, userId: number, key: string): IdempotencyKeyRow | undefined {
  return db
    .select()
    .from(idempotencyKeys)
    .where(and(eq(idempotencyKeys.userId, userId), eq(idempotencyKeys.key, key)))
    .get();
}

export function insertKey(db: Executor, values: NewIdempotencyKey): void {
  db.insert(idempotencyKeys).values(values).run();
}

export function deleteKeysCreatedBefore(db: Executor, before: Date): number {
  return db.delete(idempotencyKeys).where(lt(idempotencyKeys.createdAt, before)).run().changes;
}
