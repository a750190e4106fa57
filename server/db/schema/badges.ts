import { sql } from 'drizzle-orm';
import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { users } from './users';

/**
 * A person's badge for the crib station: a printed QR code holding an opaque random token (never the
 * e-mail or the id). Only a SHA-256 of the token is stored. Issuing a new badge revokes the old one,
 * so a person has at most one badge that works.
 */
export const badges = sqliteTable(
  'badges',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    userId: integer()
      .notNull()
      .references(() => users.id),
    tokenHash: text().notNull(),
    issuedById: integer()
      .notNull()
      .references(() => users.id),
    issuedAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(cast(unixepoch('subsec') * 1000 as integer))`),
    revokedAt: integer({ mode: 'timestamp_ms' }),
  },
  (t) => [
    uniqueIndex('badges_hash_unique').on(t.tokenHash),
    uniqueIndex('badges_one_working_per_person').on(t.userId).where(sql`${t.revokedAt} is null`),
    index('badges_user_idx').on(t.userId),
  ],
);

export type BadgeRow = typeof badges.$inferSelect;
