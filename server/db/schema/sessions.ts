import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';

/** express-session rows: `sess` is the session as JSON, `expiresAt` in epoch milliseconds. */
export const sessions = sqliteTable(
  'sessions',
  {
    sid: text().primaryKey(),
    sess: text().notNull(),
    expiresAt: integer().notNull(),
  },
  (t) => [index('sessions_expires_idx').on(t.expiresAt)],
);
