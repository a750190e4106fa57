import { sql } from 'drizzle-orm';
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';

/** Messages caught by the built-in mail catcher (development, demo and tests). */
export const caughtMail = sqliteTable(
  'caught_mail',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    messageId: text(),
    fromAddress: text().notNull(),
    toAddresses: text().notNull(),
    subject: text().notNull(),
    textBody: text().notNull(),
    /** JSON array of the http(s) links found in the message. */
    links: text().notNull(),
    receivedAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(cast(unixepoch('subsec') * 1000 as integer))`),
  },
  (t) => [index('caught_mail_received_idx').on(t.receivedAt)],
);
