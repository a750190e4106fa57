import { sql } from 'drizzle-orm';
import { check, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';

export const users = sqliteTable(
  'users',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    email: text().notNull(),
    name: text().notNull(),
    role: text({ enum: ['member', 'quartermaster', 'lead'] }).notNull(),
    passwordHash: text().notNull(),
    phone: text(),
    /** How this person types rivet line lengths: inches or millimetres. */
    preferredUnit: text({ enum: ['in', 'mm'] }).notNull().default('in'),
    /** The crib station PIN (4–8 digits), as an argon2id hash like the password; null when none is set. */
    pinHash: text(),
    /** Set when the lead deactivates the person; they keep their history but cannot sign in. */
    deactivatedAt: integer({ mode: 'timestamp_ms' }),
    createdAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(cast(unixepoch('subsec') * 1000 as integer))`),
  },
  (t) => [
    uniqueIndex('users_email_unique').on(sql`lower(${t.email})`),
    check('users_role_check', sql`${t.role} in ('member', 'quartermaster', 'lead')`),
  ],
);

export type UserRow = typeof users.$inferSelect;
