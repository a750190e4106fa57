import { eq } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { stockSlips } from '../../db/schema/stock';

export function slipExists(db: Executor, id: number): boolean {
  return db.select({ id: stockSlips.id }).from(stockSlips).where(eq(stockSlips.id, id)).get() !== undefined;
}

export function insertSlip(db: Executor, values: typeof stockSlips.$inferInsert) {
  return db.insert(stockSlips).values(values).returning({ id: stockSlips.id }).get();
}

export function findSlip(db: Executor, id: number) {
  return db.select().from(stockSlips).where(eq(stockSlips.id, id)).get();
}
