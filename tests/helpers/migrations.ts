import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import { expect } from 'vitest';
import { MIGRATIONS, openDatabase, type Database } from '../../server/db/client';

/**
 * Runs `check` on an in-memory database migrated up to, not including, the migration whose tag
 * ends in `_${name}`: the test fills in rows as they were, then runs the rest with migrateDatabase.
 */
export function beforeMigration(name: string, check: (db: Database) => void): void {
  const journal = JSON.parse(readFileSync(join(MIGRATIONS, 'meta/_journal.json'), 'utf8')) as { entries: { tag: string }[] };
  const at = journal.entries.findIndex((e) => e.tag.endsWith(`_${name}`));
  expect(at).toBeGreaterThan(0);
  const dir = mkdtempSync(join(tmpdir(), 'gripline-migrations-'));
  const db = openDatabase(':memory:');
  try {
    cpSync(MIGRATIONS, dir, { recursive: true });
    writeFileSync(join(dir, 'meta/_journal.json'), JSON.stringify({ ...journal, entries: journal.entries.slice(0, at) }));
    migrate(db, { migrationsFolder: dir });
    check(db);
  } finally {
    db.$client.close();
    rmSync(dir, { recursive: true, force: true });
  }
}
