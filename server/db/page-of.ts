import { count, type SQL } from 'drizzle-orm';
import type { SQLiteColumn, SQLiteTable } from 'drizzle-orm/sqlite-core';
import type { Executor } from './client';

/** A page of a table's rows that match `where`, in `order`, with how many match in all: two queries. */
export function pageOf<T extends SQLiteTable>(
  db: Executor,
  table: T,
  where: SQL | undefined,
  order: SQLiteColumn | SQL,
  { page, pageSize }: { page: number; pageSize: number },
): { rows: T['$inferSelect'][]; total: number } {
  const total = db.select({ n: count() }).from(table).where(where).get()?.n ?? 0;
  const rows = db
    .select()
    .from(table as SQLiteTable)
    .where(where)
    .orderBy(order)
    .limit(pageSize)
    .offset((page - 1) * pageSize)
    .all() as T['$inferSelect'][];
  return { rows, total };
}
