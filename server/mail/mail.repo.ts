import { desc, eq, sql } from 'drizzle-orm';
import type { Executor } from '../db/client';
import { caughtMail, outboxMail, type CaughtMailRow, type OutboxMailRow } from '../db/schema/mail';

export type { OutboxMailRow };

/** The outbox, newest first. */
export function listOutboxMail(db: Executor, limit: number): OutboxMailRow[] {
  return db
    .select()
    .from(outboxMail)
    .orderBy(desc(outboxMail.createdAt), desc(outboxMail.id))
    .limit(limit)
    .all();
}

export function findOutboxMail(db: Executor, id: number): OutboxMailRow | undefined {
  return db.select().from(outboxMail).where(eq(outboxMail.id, id)).get();
}

/** What the local mail catcher received for one address, newest first. */
export function listCaughtMailTo(db: Executor, address: string, limit: number): CaughtMailRow[] {
  return db
    .select()
    .from(caughtMail)
    .where(sql`exists (select 1 from json_each(${caughtMail.toAddresses}) where lower(json_each.value) = ${address.toLowerCase()})`)
    .orderBy(desc(caughtMail.receivedAt), desc(caughtMail.id))
    .limit(limit)
    .all();
}
