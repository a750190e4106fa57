import { sql } from 'drizzle-orm';
import { integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { users } from './users';

/** A sign-off the chapter lead defines (e.g. "Air tools"): who may use which powered tools. */
export const signoffs = sqliteTable(
  'signoffs',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    name: text().notNull(),
    description: text().notNull().default(''),
    createdAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(cast(unixepoch('subsec') * 1000 as integer))`),
  },
  (t) => [uniqueIndex('signoffs_name_unique').on(sql`lower(${t.name})`)],
);

/** A member signed off for a sign-off: granted on a date by someone, until revoked. */
export const memberSignoffs = sqliteTable(
  'member_signoffs',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    signoffId: integer()
      .notNull()
      .references(() => signoffs.id),
    userId: integer()
      .notNull()
      .references(() => users.id),
    grantedAt: integer({ mode: 'timestamp_ms' }).notNull(),
    grantedById: integer()
      .notNull()
      .references(() => users.id),
    revokedAt: integer({ mode: 'timestamp_ms' }),
    revokedById: integer().references(() => users.id),
  },
  (t) => [uniqueIndex('member_signoffs_one_active').on(t.signoffId, t.userId).where(sql`${t.revokedAt} is null`)],
);
