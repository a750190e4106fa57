import { sql } from 'drizzle-orm';
import { check, index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';

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

export type CaughtMailRow = typeof caughtMail.$inferSelect;

export const OUTBOX_STATES = ['waiting', 'sent', 'failed'] as const;
export type OutboxState = (typeof OUTBOX_STATES)[number];

/**
 * Every message Gripline sends, written in the transaction of the change it tells about and sent
 * afterwards by the outbox worker (server/mail/outbox.ts owns the states: waiting → sent, or
 * waiting → failed after too many attempts, and failed → waiting on a retry).
 */
export const outboxMail = sqliteTable(
  'outbox_mail',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    toAddress: text().notNull(),
    subject: text().notNull(),
    textBody: text().notNull(),
    state: text({ enum: OUTBOX_STATES }).notNull().default('waiting'),
    /** Sending attempts that failed since it was written (or last retried). */
    attempts: integer().notNull().default(0),
    /** When a waiting message is due to be tried (again). */
    nextAttemptAt: integer({ mode: 'timestamp_ms' }).notNull(),
    lastError: text(),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull(),
    sentAt: integer({ mode: 'timestamp_ms' }),
  },
  (t) => [
    index('outbox_mail_due_idx').on(t.state, t.nextAttemptAt),
    index('outbox_mail_to_idx').on(t.toAddress),
    check('outbox_mail_state_check', sql`${t.state} in ('waiting', 'sent', 'failed')`),
    check('outbox_mail_attempts_check', sql`${t.attempts} >= 0`),
    check('outbox_mail_sent_check', sql`(${t.state} = 'sent') = (${t.sentAt} is not null)`),
  ],
);

export type OutboxMailRow = typeof outboxMail.$inferSelect;
