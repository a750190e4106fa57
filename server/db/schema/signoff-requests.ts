import { sql } from 'drizzle-orm';
import { check, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { SIGNOFF_REQUEST_STATES } from '@shared/schemas/signoff-requests';
import { signoffs } from './signoffs';
import { tools } from './tools';
import { users } from './users';

/**
 * A member asking for a sign-off from a tool's page. One open request per person and sign-off
 * (so per tool too); the lead grants it (through the grant itself, which closes it) or declines it
 * with a reason. Closed requests stay on record.
 */
export const signoffRequests = sqliteTable(
  'signoff_requests',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    signoffId: integer()
      .notNull()
      .references(() => signoffs.id),
    userId: integer()
      .notNull()
      .references(() => users.id),
    /** The tool the member asked from. */
    toolId: integer()
      .notNull()
      .references(() => tools.id),
    note: text().notNull().default(''),
    state: text({ enum: SIGNOFF_REQUEST_STATES }).notNull().default('open'),
    askedAt: integer({ mode: 'timestamp_ms' }).notNull(),
    closedAt: integer({ mode: 'timestamp_ms' }),
    closedById: integer().references(() => users.id),
    declineReason: text(),
  },
  (t) => [
    uniqueIndex('signoff_requests_one_open').on(t.signoffId, t.userId).where(sql`${t.state} = 'open'`),
    check('signoff_requests_state_check', sql`${t.state} in ('open', 'granted', 'declined')`),
    check('signoff_requests_closed_check', sql`(${t.state} = 'open') = (${t.closedAt} is null)`),
  ],
);
