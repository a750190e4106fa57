import type { MailMessage } from '@shared/schemas/mail';
import { maskResetLinks } from '../../accounts/link-tokens';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { linksIn } from '../../mail/links';
import { retryFailedMail } from '../../mail/outbox';
import { findOutboxMail, listCaughtMailTo, listOutboxMail, type OutboxMailRow } from '../../mail/mail.repo';

const SHOWN = 200;

const sameAddress = (a: string, b: string) => a.toLowerCase() === b.toLowerCase();

/** A message as the reader may see it: a reset link in mail to someone else is masked. */
function asSeenBy(row: OutboxMailRow, reader: UserRow): MailMessage {
  const text = sameAddress(row.toAddress, reader.email) ? row.textBody : maskResetLinks(row.textBody);
  return {
    id: row.id,
    to: row.toAddress,
    subject: row.subject,
    text,
    links: linksIn(text),
    state: row.state,
    attempts: row.attempts,
    lastError: row.lastError,
    nextAttemptAt: row.state === 'waiting' ? row.nextAttemptAt.toISOString() : null,
    createdAt: row.createdAt.toISOString(),
    sentAt: row.sentAt?.toISOString() ?? null,
  };
}

/** Every message Gripline has written, for the lead's Sent mail. */
export function listSentMail(ctx: ServiceContext, lead: UserRow): MailMessage[] {
  return listOutboxMail(ctx.db, SHOWN).map((row) => asSeenBy(row, lead));
}

/** What the local mail catcher holds for the signed-in person, whole: their inbox when mail stays on this computer. */
export function listMyMail(ctx: ServiceContext, reader: UserRow): MailMessage[] {
  return listCaughtMailTo(ctx.db, reader.email, SHOWN).map((row) => ({
    id: row.id,
    to: reader.email,
    subject: row.subject,
    text: row.textBody,
    links: linksIn(row.textBody),
    state: 'sent',
    attempts: 0,
    lastError: null,
    nextAttemptAt: null,
    createdAt: row.receivedAt.toISOString(),
    sentAt: row.receivedAt.toISOString(),
  }));
}

/** Gives a failed message a fresh round of attempts, starting now. */
export function retryMail(ctx: ServiceContext, lead: UserRow, id: number): MailMessage {
  const row = findOutboxMail(ctx.db, id);
  if (!row) throw new HttpError(404, 'MAIL_NOT_FOUND', `No message has the id ${id}.`);
  if (!retryFailedMail(ctx.db, id, ctx.now())) {
    const now = row.state === 'sent' ? 'it has been sent already' : 'it is still waiting to be sent';
    throw new HttpError(409, 'MAIL_NOT_FAILED', `Only a failed message can be retried; ${now}.`);
  }
  return asSeenBy(findOutboxMail(ctx.db, id)!, lead);
}
