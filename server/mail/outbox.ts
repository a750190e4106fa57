import { HOUR_MS, MINUTE_MS } from '@shared/time/durations';
import { and, asc, eq, lte } from 'drizzle-orm';
import { maskResetLinks } from '../accounts/link-tokens';
import type { Executor } from '../db/client';
import { outboxMail, type OutboxMailRow, type OutboxState } from '../db/schema/mail';
import type { Mailer, OutgoingMail } from './mailer';

/** A message that failed this many times in a row is marked failed; the lead can retry it. */
export const OUTBOX_MAX_ATTEMPTS = 8;
const FIRST_RETRY_MS = MINUTE_MS;
const LONGEST_RETRY_MS = HOUR_MS;
/**
 * While a message is with the mail server nobody else picks it up; should the process stop in the
 * middle, it is tried again after this.
 */
const SENDING_LEASE_MS = 5 * MINUTE_MS;
const BATCH = 20;

/** Wait after the n-th failed attempt: 1, 2, 4, 8 … minutes, at most an hour. */
export function retryDelayMs(failedAttempts: number): number {
  return Math.min(FIRST_RETRY_MS * 2 ** Math.max(failedAttempts - 1, 0), LONGEST_RETRY_MS);
}

type OutboxEvent = 'claimed' | 'delivered' | 'attempt_failed' | 'gave_up' | 'retried';

/** The only moves a message makes; each write below names its event and checks the state it starts from. */
const TRANSITIONS: Record<OutboxEvent, { from: OutboxState; to: OutboxState }> = {
  claimed: { from: 'waiting', to: 'waiting' },
  delivered: { from: 'waiting', to: 'sent' },
  attempt_failed: { from: 'waiting', to: 'waiting' },
  gave_up: { from: 'waiting', to: 'failed' },
  retried: { from: 'failed', to: 'waiting' },
};

type Changes = Partial<Pick<OutboxMailRow, 'attempts' | 'nextAttemptAt' | 'lastError' | 'sentAt' | 'textBody'>>;

function move(db: Executor, row: Pick<OutboxMailRow, 'id'>, event: OutboxEvent, changes: Changes, extra?: ReturnType<typeof eq>): boolean {
  const { from, to } = TRANSITIONS[event];
  return (
    db
      .update(outboxMail)
      .set({ ...changes, state: to })
      .where(and(eq(outboxMail.id, row.id), eq(outboxMail.state, from), extra))
      .run().changes === 1
  );
}

/**
 * Writes a message to the outbox. Call it with the transaction of the change the message tells
 * about, so both are kept or neither; the worker sends it afterwards.
 */
export function queueMail(db: Executor, mail: OutgoingMail, now: Date): void {
  db.insert(outboxMail).values({ toAddress: mail.to, subject: mail.subject, textBody: mail.text, state: 'waiting', nextAttemptAt: now, createdAt: now }).run();
}

/** Puts a failed message back in the queue for a fresh round of attempts; false when it is not failed. */
export function retryFailedMail(db: Executor, id: number, now: Date): boolean {
  return move(db, { id }, 'retried', { attempts: 0, nextAttemptAt: now });
}

export interface OutboxRun {
  sent: number;
  /** Failed this time, to be tried again later. */
  retrying: number;
  /** Failed for the last time. */
  failed: number;
}

export interface OutboxDeps {
  db: Executor;
  mailer: Mailer;
  now: () => Date;
}

const errorWords = (err: unknown) => ((err instanceof Error ? err.message : String(err)) || 'Unknown error').slice(0, 500);

/** Sends every waiting message that is due, one at a time; a failure waits longer each time, then gives up. */
export async function deliverDueMail({ db, mailer, now }: OutboxDeps): Promise<OutboxRun> {
  const run: OutboxRun = { sent: 0, retrying: 0, failed: 0 };
  for (;;) {
    const due = db
      .select()
      .from(outboxMail)
      .where(and(eq(outboxMail.state, 'waiting'), lte(outboxMail.nextAttemptAt, now())))
      .orderBy(asc(outboxMail.nextAttemptAt), asc(outboxMail.id))
      .limit(BATCH)
      .all();
    if (due.length === 0) return run;
    for (const row of due) {
      const lease = new Date(now().getTime() + SENDING_LEASE_MS);
      if (!move(db, row, 'claimed', { nextAttemptAt: lease }, eq(outboxMail.nextAttemptAt, row.nextAttemptAt))) continue;
      try {
        await mailer.send({ to: row.toAddress, subject: row.subject, text: row.textBody });
        // Once it has left, the copy kept here no longer holds a live reset link.
        move(db, row, 'delivered', { sentAt: now(), lastError: null, textBody: maskResetLinks(row.textBody) });
        run.sent++;
      } catch (err) {
        const attempts = row.attempts + 1;
        if (attempts >= OUTBOX_MAX_ATTEMPTS) {
          move(db, row, 'gave_up', { attempts, lastError: errorWords(err) });
          run.failed++;
        } else {
          move(db, row, 'attempt_failed', { attempts, lastError: errorWords(err), nextAttemptAt: new Date(now().getTime() + retryDelayMs(attempts)) });
          run.retrying++;
        }
      }
    }
  }
}
