import { desc } from 'drizzle-orm';
import type { CaughtMail } from '@shared/schemas/mail';
import type { Executor } from '../../db/client';
import { caughtMail } from '../../db/schema/mail';

export function listCaughtMail(db: Executor, limit: number): CaughtMail[] {
  return db
    .select()
    .from(caughtMail)
    .orderBy(desc(caughtMail.receivedAt), desc(caughtMail.id))
    .limit(limit)
    .all()
    .map((m) => ({
      id: m.id,
      from: m.fromAddress,
      to: JSON.parse(m.toAddresses) as string[],
      subject: m.subject,
      text: m.textBody,
      links: JSON.parse(m.links) as string[],
      receivedAt: m.receivedAt.toISOString(),
    }));
}
