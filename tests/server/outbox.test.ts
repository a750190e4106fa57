import { pino } from 'pino';
import { MINUTE_MS } from '@shared/time/durations';
import { describe, expect } from 'vitest';
import { caughtMail, outboxMail } from '../../server/db/schema/mail';
import type { Mailer, OutgoingMail } from '../../server/mail/mailer';
import { OUTBOX_MAX_ATTEMPTS, queueMail, retryDelayMs } from '../../server/mail/outbox';
import { startOutboxWorker } from '../../server/mail/outbox-worker';
import { addToolAs, post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';

/** A mail server that refuses everything, counting what it was offered. */
function refusingMailer(): Mailer & { offered: OutgoingMail[] } {
  const offered: OutgoingMail[] = [];
  return { offered, send: (mail) => (offered.push(mail), Promise.reject(new Error('connect ECONNREFUSED 127.0.0.1:25'))), close: () => undefined };
}

const test = crewTest
  .extend('later', ({ clock }) => (ms: number) => {
    clock.now = new Date(clock.now.getTime() + ms);
  })
  .extend('rows', ({ t }) => () => t.db.select().from(outboxMail).all())
  .extend('oneMessage', ({ t }) => (to = 'someone@example.org') => queueMail(t.db, { to, subject: 'Test message', text: 'Hello' }, t.clock.now));

describe('a tool return while the mail server is down', () => {
  test('answers 200, keeps the hold offer with its e-mail waiting, and a later run with a working server sends it', async ({ t, qm, member, later, rows }) => {
    const { code } = await addToolAs(qm, { name: 'Torque wrench', category: 'torque_wrench' });
    await post(member, `/api/tools/${code}/checkout`).expect(201);
    await post(qm, `/api/tools/${code}/holds`).expect(201);

    const back = await post(member, `/api/tools/${code}/return`, { condition: 'ok' });
    expect(back.status).toBe(200);
    expect(back.body).toMatchObject({ status: 'held', offeredTo: { name: 'Quinn Quartermaster' } });

    const down = refusingMailer();
    expect(await t.deliverMail(down)).toEqual({ sent: 0, retrying: 1, failed: 0 });
    expect(down.offered.map((m) => m.to)).toEqual(['qm@example.org']);
    expect(rows()).toEqual([
      expect.objectContaining({ toAddress: 'qm@example.org', subject: `${code} Torque wrench is back and held for you`, state: 'waiting', attempts: 1, lastError: 'connect ECONNREFUSED 127.0.0.1:25' }),
    ]);
    expect((await qm.agent.get(`/api/tools/${code}`)).body.status).toBe('held');

    later(MINUTE_MS);
    expect(await t.deliverMail()).toEqual({ sent: 1, retrying: 0, failed: 0 });
    expect(rows()[0]).toMatchObject({ state: 'sent', sentAt: t.clock.now });
    expect((await t.lastMailTo('qm@example.org'))?.subject).toBe(`${code} Torque wrench is back and held for you`);
  });

  test('writes no mail when the return is refused', async ({ qm, member, rows }) => {
    const { code } = await addToolAs(qm, { name: 'Torque wrench', category: 'torque_wrench' });
    await post(qm, `/api/tools/${code}/holds`).expect(201);
    expect((await post(member, `/api/tools/${code}/return`, { condition: 'ok' })).status).toBe(409);
    expect(rows()).toEqual([]);
  });
});

describe('deliverDueMail', () => {
  test('waits 1, 2, 4, 8 … minutes after each failure and sends nothing before the time', async ({ t, later, rows, oneMessage }) => {
    expect([1, 2, 3, 4, 5].map(retryDelayMs)).toEqual([1, 2, 4, 8, 16].map((n) => n * MINUTE_MS));
    expect(retryDelayMs(20)).toBe(60 * MINUTE_MS);
    oneMessage();
    const down = refusingMailer();
    for (const [attempt, wait] of [[1, 1], [2, 2], [3, 4]] as const) {
      await t.deliverMail(down);
      expect(rows()[0]).toMatchObject({ state: 'waiting', attempts: attempt, nextAttemptAt: new Date(t.clock.now.getTime() + wait * MINUTE_MS) });
      later(wait * MINUTE_MS - 1000);
      expect(await t.deliverMail(down)).toEqual({ sent: 0, retrying: 0, failed: 0 });
      later(1000);
    }
    expect(down.offered).toHaveLength(3);
  });

  test('marks a message failed after the last attempt and tries it no more', async ({ t, later, rows, oneMessage }) => {
    oneMessage();
    const down = refusingMailer();
    for (let i = 1; i < OUTBOX_MAX_ATTEMPTS; i++) {
      expect(await t.deliverMail(down)).toEqual({ sent: 0, retrying: 1, failed: 0 });
      later(2 * 60 * MINUTE_MS);
    }
    expect(await t.deliverMail(down)).toEqual({ sent: 0, retrying: 0, failed: 1 });
    expect(rows()[0]).toMatchObject({ state: 'failed', attempts: OUTBOX_MAX_ATTEMPTS, lastError: 'connect ECONNREFUSED 127.0.0.1:25', sentAt: null });
    later(24 * 60 * MINUTE_MS);
    expect(await t.deliverMail()).toEqual({ sent: 0, retrying: 0, failed: 0 });
    expect(down.offered).toHaveLength(OUTBOX_MAX_ATTEMPTS);
  });

  test('sends each message once even when two runs overlap', async ({ t, oneMessage }) => {
    for (let i = 0; i < 5; i++) oneMessage(`person${i}@example.org`);
    const runs = await Promise.all([t.deliverMail(), t.deliverMail()]);
    expect(runs[0].sent + runs[1].sent).toBe(5);
    expect(t.db.select().from(caughtMail).all()).toHaveLength(5);
  });

  test('keeps the messages of a change that rolled back out of the outbox', ({ t, rows }) => {
    expect(() =>
      t.db.transaction((tx) => {
        queueMail(tx, { to: 'someone@example.org', subject: 'Never', text: 'Never' }, t.clock.now);
        throw new Error('the change failed');
      }),
    ).toThrow('the change failed');
    expect(rows()).toEqual([]);
  });
});

describe('the outbox worker', () => {
  test('sends waiting mail in the background until stopped', async ({ t, rows, oneMessage }) => {
    const worker = startOutboxWorker({ db: t.db, mailer: t.mailer, now: () => t.clock.now }, pino({ level: 'silent' }), 20);
    try {
      oneMessage();
      await expect.poll(() => rows()[0]?.state, { timeout: 5000, interval: 20 }).toBe('sent');
      expect(t.db.select().from(caughtMail).all()).toHaveLength(1);
    } finally {
      await worker.stop();
    }
    oneMessage('after-stop@example.org');
    await new Promise((resolve) => setTimeout(resolve, 100));
    expect(rows().find((r) => r.toAddress === 'after-stop@example.org')?.state).toBe('waiting');
  });
});
