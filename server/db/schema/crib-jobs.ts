import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { loans } from './tools';
import { users } from './users';

/** Overdue reminders: at most one per loan per day (the unique index keeps it so). */
export const loanReminders = sqliteTable(
  'loan_reminders',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    loanId: integer()
      .notNull()
      .references(() => loans.id),
    /** The chapter's calendar day, YYYY-MM-DD. */
    day: text().notNull(),
    sentAt: integer({ mode: 'timestamp_ms' }).notNull(),
    sentById: integer().references(() => users.id),
  },
  (t) => [uniqueIndex('loan_reminders_one_per_day').on(t.loanId, t.day)],
);

/** Each run of a scheduled job, shown to the lead ("last run"). */
export const jobRuns = sqliteTable(
  'job_runs',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    job: text().notNull(),
    startedAt: integer({ mode: 'timestamp_ms' }).notNull(),
    finishedAt: integer({ mode: 'timestamp_ms' }),
    summary: text().notNull().default(''),
    error: text(),
  },
  (t) => [index('job_runs_job_idx').on(t.job, t.startedAt)],
);

/** Chapter settings as key/value pairs (e.g. how long a returned tool is held for the next person). */
export const settings = sqliteTable('settings', {
  key: text().primaryKey(),
  value: text().notNull(),
});
