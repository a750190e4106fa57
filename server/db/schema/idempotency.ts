import { sql } from 'drizzle-orm';
import { check, index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { users } from './users';

/**
 * A client-made key for an action a phone may send twice (a queued scan replayed after the network
 * came back): the first answer is kept and given again. Keys are per person; the unique index is
 * the last word when two copies of a request race. Written in the action's own transaction.
 */
export const idempotencyKeys = sqliteTable(
  'idempotency_keys',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    userId: integer()
      .notNull()
      .references(() => users.id),
    key: text().notNull(),
    method: text().notNull(),
    path: text().notNull(),
    /** SHA-256 (hex) of the body as canonical JSON (keys sorted). */
    bodyHash: text().notNull(),
    status: integer().notNull(),
    /** The JSON answer, as sent the first time. */
    answer: text().notNull(),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [
    uniqueIndex('idempotency_keys_user_key_unique').on(t.userId, t.key),
    index('idempotency_keys_created_idx').on(t.createdAt),
    check('idempotency_keys_status_check', sql`${t.status} between 200 and 499`),
  ],
);

export type IdempotencyKeyRow = typeof idempotencyKeys.$inferSelect;
