import { desc, eq, sql } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { outboxMail, type OutboxMailRow } from '../../db/schema/mail';

/** The outbox, newest first; only what was written to one address when given. */
export function listOutboxMail(db: Executor, limit: number, toAddress?: string): OutboxMailRow[] {
  return db
    .select()
    .from(outboxMail)
    .where(toAddress === undefined ? undefined : eq(sql`lower(${outboxMail.toAddress})`, toAddress.toLowerCase()))
    .orderBy(desc(outboxMail.createdAt), desc(outboxMail.id))
    .limit(limit)
    .all();
}

export function findOutboxMail(db: Executor, id: number): OutboxMailRow | undefined {
  return db.select().from(outboxMail).where(eq(outboxMail.id, id)).get();
}
