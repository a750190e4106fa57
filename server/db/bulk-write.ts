import type { Statement } from 'better-sqlite3';
import { getTableColumns, getTableName } from 'drizzle-orm';
import { CasingCache } from 'drizzle-orm/casing';
import type { SQLiteColumn, SQLiteTable } from 'drizzle-orm/sqlite-core';
import type { Database } from './client';

/**
 * Thousands of rows written inside one transaction (a bins import), which must stay short: nothing
 * else runs on the connection meanwhile. Drizzle's builder, even prepared, spends more per row
 * mapping values than SQLite spends writing them (5,000 bins and their opening entries: about 700 ms
 * built, 130 ms prepared, 60 ms here), so these run plain statements built from the table's own
 * column names, with each value mapped by its column as Drizzle would (dates to numbers and so on).
 */
const statements = new WeakMap<Database, Map<string, Statement>>();

function statement(db: Database, sql: string): Statement {
  let cache = statements.get(db);
  if (!cache) statements.set(db, (cache = new Map<string, Statement>()));
  let prepared = cache.get(sql);
  if (!prepared) cache.set(sql, (prepared = db.$client.prepare(sql)));
  return prepared;
}

const quoted = (name: string) => `"${name.replace(/"/g, '""')}"`;
/** Column names as the database has them: the connection is opened with Drizzle's snake_case casing (db/client.ts). */
const casing = new CasingCache('snake_case');
const sqlName = (column: SQLiteColumn) => quoted(casing.getColumnCasing(column));

/** The table's columns for these keys, in the keys' order; a key that is not a column is a programming error. */
function columnsOf(table: SQLiteTable, keys: readonly string[]): SQLiteColumn[] {
  const columns = getTableColumns(table) as Record<string, SQLiteColumn>;
  return keys.map((key) => {
    const column = columns[key];
    if (!column) throw new Error(`${getTableName(table)} has no column ${key}`);
    return column;
  });
}

const driverValue = (column: SQLiteColumn, value: unknown) => (value === null || value === undefined ? null : column.mapToDriverValue(value));

/** Rows per INSERT: fewer calls into SQLite, well under its limit of 32,766 bound values. */
const ROWS_PER_INSERT = 50;

/**
 * Inserts every row (all with the same keys as the first) and answers their new ids in order. The
 * table's id is an AUTOINCREMENT key, so ids grow in the order the rows are written; RETURNING may
 * list them in any order, hence the sort.
 */
export function insertRows<T extends SQLiteTable>(db: Database, table: T, rows: readonly T['$inferInsert'][]): number[] {
  if (rows.length === 0) return [];
  const keys = Object.keys(rows[0]!);
  const columns = columnsOf(table, keys);
  const head = `insert into ${quoted(getTableName(table))} (${columns.map(sqlName).join(', ')}) values `;
  const tuple = `(${columns.map(() => '?').join(', ')})`;
  const ids: number[] = [];
  for (let start = 0; start < rows.length; start += ROWS_PER_INSERT) {
    const batch = rows.slice(start, start + ROWS_PER_INSERT);
    const insert = statement(db, `${head}${Array.from(batch, () => tuple).join(', ')} returning "id"`);
    const values = batch.flatMap((row) => columns.map((c, i) => driverValue(c, (row as Record<string, unknown>)[keys[i]!])));
    ids.push(...(insert.all(...values) as { id: number }[]).map((r) => r.id).sort((a, b) => a - b));
  }
  return ids;
}

/** Sets the same fields (the keys of the first change) on each row by id. */
export function updateRowsById<T extends SQLiteTable>(db: Database, table: T, changes: readonly { id: number; set: Partial<T['$inferInsert']> }[]): void {
  if (changes.length === 0) return;
  const keys = Object.keys(changes[0]!.set);
  const columns = columnsOf(table, keys);
  const update = statement(db, `update ${quoted(getTableName(table))} set ${columns.map((c) => `${sqlName(c)} = ?`).join(', ')} where "id" = ?`);
  for (const { id, set } of changes) {
    const values = set as Record<string, unknown>;
    update.run(...columns.map((c, i) => driverValue(c, values[keys[i]!])), id);
  }
}
