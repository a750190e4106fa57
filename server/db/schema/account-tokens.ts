import { sql } from 'drizzle-orm';
import { check, index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { users } from './users';

/**
 * Single-use links sent by e-mail: invitations (lead → new person) and password resets.
 * Only a SHA-256 of the token is stored, so a copy of the database cannot be used to sign in.
 */
export const accountTokens = sqliteTable(
  'account_tokens',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    kind: text({ enum: ['invitation', 'password_reset'] }).notNull(),
    tokenHash: text().notNull(),
    email: text().notNull(),
    role: text({ enum: ['member', 'quartermaster', 'lead'] }),
    userId: integer().references(() => users.id),
    createdById: integer().references(() => users.id),
    expiresAt: integer({ mode: 'timestamp_ms' }).notNull(),
    usedAt: integer({ mode: 'timestamp_ms' }),
    revokedAt: integer({ mode: 'timestamp_ms' }),
    createdAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(cast(unixepoch('subsec') * 1000 as integer))`),
  },
  (t) => [
    uniqueIndex('account_tokens_hash_unique').on(t.tokenHash),
    index('account_tokens_email_idx').on(t.kind, t.email),
    check('account_tokens_kind_check', sql`${t.kind} in ('invitation', 'password_reset')`),
    check(
      'account_tokens_shape_check',
      sql`(${t.kind} = 'invitation' and ${t.role} is not null) or (${t.kind} = 'password_reset' and ${t.userId} is not null)`,
    ),
  ],
);

export type AccountTokenRow = typeof accountTokens.$inferSelect;
