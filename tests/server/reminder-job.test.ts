import { eq } from 'drizzle-orm';
import { describe, expect } from 'vitest';
import { overdueListSchema } from '@shared/schemas/overdue';
import { jobRuns } from '../../server/db/schema/crib-jobs';
import { outboxMail } from '../../server/db/schema/mail';
import { users } from '../../server/db/schema/users';
import { runOverdueReminders } from '../../server/features/tools/reminder-job';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { crewTest } from '../helpers/crew-test';
import { addToolAs, lend, post } from '../helpers/crib';

const DAY_MS = 24 * 60 * 60 * 1000;
const HOUR_MS = 60 * 60 * 1000;

const test = crewTest
  .extend('later', ({ t }) => (ms: number) => {
    t.clock.now = new Date(t.clock.now.getTime() + ms);
  })
  /** Messages written to an address, sent or not. */
  .extend('mailsTo', ({ t }) => (address: string) => t.db.select().from(outboxMail).where(eq(outboxMail.toAddress, address)).all())
  .extend('addTool', ({ qm }) => async (body: Record<string, unknown>) => (await addToolAs(qm, body)).code)
  /** Two overdue loans (the member's wrench 9 days late, the quartermaster's drill 6) and one not yet due. */
  .extend('twoOverdueLoans', ({ t, qm, member, later, addTool }) => async () => {
    const wrench = await addTool({ name: 'Torque wrench', category: 'torque_wrench', location: 'Cabinet B', replacementValueCents: 25_000 });
    const drill = await addTool({ name: 'Air drill', category: 'air_drill', replacementValueCents: 18_050 });
    const puller = await addTool({ name: 'Hand rivet puller', category: 'hand_rivet_puller' });
    const wrenchLoan = await lend(t, member, wrench, 1 * DAY_MS);
    const drillLoan = await lend(t, qm, drill, 4 * DAY_MS);
    await lend(t, member, puller, 30 * DAY_MS);
    later(10 * DAY_MS);
    return { wrench, drill, wrenchLoan, drillLoan };
  });

test.beforeEach(({ t, crew }) => {
  t.db.update(users).set({ phone: '555-0100' }).where(eq(users.id, crew.member.id)).run();
});

describe('runOverdueReminders', () => {
  test('reminds each holder of an overdue tool and sends every active lead a digest with who, what, days late and value', async ({ t, mailsTo, twoOverdueLoans, ctx }) => {
    const { wrench, drill } = await twoOverdueLoans();
    await t.addUser({ email: 'second-lead@example.org', name: 'Sam Second', role: 'lead' });
    const gone = await t.addUser({ email: 'former-lead@example.org', name: 'Fay Former', role: 'lead' });
    t.db.update(users).set({ deactivatedAt: t.clock.now }).where(eq(users.id, gone.id)).run();

    const result = runOverdueReminders(ctx);
    expect(result).toEqual({ summary: '2 reminders, digest to 2 leads', remindersSent: 2, digestsSent: 2, holdOffersExpired: 0, error: null });

    expect((await t.lastMailTo('member@example.org'))?.subject).toBe(`Reminder: ${wrench} Torque wrench was due back on Wednesday, December 2`);
    expect((await t.lastMailTo('qm@example.org'))?.text).toContain('is now 6 days late');
    expect(mailsTo('member@example.org')).toHaveLength(1);

    const digest = await t.lastMailTo('lead@example.org');
    expect(digest?.subject).toBe('Overdue tools: 2 tools are late back');
    expect(digest?.text).toContain('replacement value $430.50 in all');
    expect(digest?.text).toContain(`- ${wrench} Torque wrench: Mia Member (member@example.org, 555-0100), due Wednesday, December 2, 9 days late, value $250.00`);
    expect(digest?.text).toContain(`- ${drill} Air drill: Quinn Quartermaster (qm@example.org), due Saturday, December 5, 6 days late, value $180.50`);
    expect(digest!.text.indexOf(wrench)).toBeLessThan(digest!.text.indexOf(drill));
    expect(digest?.links).toContain('http://gripline.test/overdue');
    expect((await t.lastMailTo('second-lead@example.org'))?.subject).toBe('Overdue tools: 2 tools are late back');
    expect(await t.lastMailTo('former-lead@example.org')).toBeUndefined();
  });

  test('records the run with its summary, and GET /api/overdue shows it as the last run', async ({ t, lead, twoOverdueLoans, ctx }) => {
    await twoOverdueLoans();
    const startedAt = t.clock.now;
    runOverdueReminders(ctx);

    const runs = t.db.select().from(jobRuns).all();
    expect(runs).toHaveLength(1);
    expect(runs[0]).toMatchObject({ job: 'overdue-reminders', startedAt, finishedAt: startedAt, summary: '2 reminders, digest to 1 lead', error: null });
    const res = await lead.agent.get('/api/overdue');
    expect(overdueListSchema.parse(res.body).lastRun).toEqual({ startedAt: startedAt.toISOString(), finishedAt: startedAt.toISOString(), summary: '2 reminders, digest to 1 lead', error: null });
    expect(res.body.data.every((l: { remindedToday: boolean }) => l.remindedToday)).toBe(true);
  });

  test('sends no second reminder when it runs twice the same day, and reminds again the next day', async ({ t, later, mailsTo, twoOverdueLoans, ctx }) => {
    await twoOverdueLoans();
    runOverdueReminders(ctx);
    later(6 * HOUR_MS);
    const second = runOverdueReminders(ctx);
    expect(second.summary).toBe('0 reminders, digest to 1 lead');
    expect(mailsTo('member@example.org')).toHaveLength(1);
    expect(mailsTo('qm@example.org')).toHaveLength(1);

    later(DAY_MS);
    const nextDay = runOverdueReminders(ctx);
    expect(nextDay.summary).toBe('2 reminders, digest to 1 lead');
    expect(mailsTo('member@example.org')).toHaveLength(2);
    expect((await t.lastMailTo('member@example.org'))?.text).toContain('is now 10 days late'); // 10 days and 6 hours past due: whole days count
  });

  test('counts “today” on the chapter’s calendar: a run after midnight in the chapter reminds again though the server’s day has not turned', async ({ t, mailsTo, twoOverdueLoans, ctx }) => {
    writeChapterTimeZone(t.db, 'Pacific/Auckland');
    await twoOverdueLoans(); // now 2026-12-11T12:00Z, Saturday 01:00 in Auckland
    t.clock.now = new Date('2026-12-11T10:30:00Z'); // Friday 23:30 in Auckland
    expect(runOverdueReminders(ctx).remindersSent).toBe(2);
    t.clock.now = new Date('2026-12-11T11:30:00Z'); // Saturday 00:30 there, the same UTC day
    expect(runOverdueReminders(ctx).remindersSent).toBe(2);
    t.clock.now = new Date('2026-12-12T10:00:00Z'); // Saturday 23:00 there: the same chapter day, the next UTC day
    expect(runOverdueReminders(ctx).remindersSent).toBe(0);
    expect(mailsTo('member@example.org')).toHaveLength(2);
    // The wrench was due by 12:00 UTC on Wednesday, December 2 (Thursday 01:00 in Auckland): 9 chapter days before Saturday.
    expect((await t.lastMailTo('member@example.org'))?.text).toContain('It was due back on Thursday, December 3 and is now 9 days late.');
  });

  test('sends no reminder for a loan the lead already reminded by hand that day', async ({ lead, mailsTo, twoOverdueLoans, ctx }) => {
    const { wrenchLoan } = await twoOverdueLoans();
    await post(lead, `/api/overdue/${wrenchLoan}/remind`).expect(201);
    const result = runOverdueReminders(ctx);
    expect(result.summary).toBe('1 reminder, digest to 1 lead');
    expect(mailsTo('member@example.org')).toHaveLength(1);
    expect(mailsTo('qm@example.org')).toHaveLength(1);
  });

  test('sends no digest when nothing is overdue', async ({ t, member, addTool, ctx }) => {
    const code = await addTool({ name: 'Spacing fan', category: 'spacing_fan' });
    await lend(t, member, code, 3 * DAY_MS);
    const result = runOverdueReminders(ctx);
    expect(result.summary).toBe('0 reminders, nothing overdue, no digest');
    expect(await t.lastMailTo('lead@example.org')).toBeUndefined();
  });

  test('moves expired hold offers on: the next person in the queue is offered the tool', async ({ t, lead, qm, member, later, addTool, ctx }) => {
    const code = await addTool({ name: 'Pneumatic rivet puller', category: 'pneumatic_rivet_puller' });
    await lend(t, member, code, 2 * DAY_MS);
    await post(qm, `/api/tools/${code}/holds`).expect(201);
    await post(lead, `/api/tools/${code}/holds`).expect(201);
    await post(member, `/api/tools/${code}/return`, { condition: 'ok' }).expect(200);
    expect(await t.lastMailTo('lead@example.org')).toBeUndefined();

    later(49 * HOUR_MS); // the default hold is 48 hours
    const result = runOverdueReminders(ctx);
    expect(result).toMatchObject({ holdOffersExpired: 1, summary: '0 reminders, nothing overdue, no digest, 1 expired hold offer moved on' });
    expect((await t.lastMailTo('lead@example.org'))?.subject).toBe(`${code} Pneumatic rivet puller is back and held for you`);
    const tool = await qm.agent.get(`/api/tools/${code}`);
    expect(tool.body).toMatchObject({ status: 'held', holds: { offeredTo: { name: 'Lee Lead' } } });
  });

  test('finishes the run when the mail server is down: the reminders wait in the outbox and a later delivery sends them', async ({ t, lead, later, mailsTo, twoOverdueLoans, ctx }) => {
    await twoOverdueLoans();
    const result = runOverdueReminders(ctx);
    expect(result).toMatchObject({ remindersSent: 2, error: null });
    const down = await t.deliverMail({ send: () => Promise.reject(new Error('connect ECONNREFUSED 127.0.0.1:1')), close: () => undefined });
    expect(down).toEqual({ sent: 0, retrying: 3, failed: 0 });
    expect(mailsTo('member@example.org')).toEqual([expect.objectContaining({ state: 'waiting', attempts: 1, lastError: 'connect ECONNREFUSED 127.0.0.1:1' })]);
    const shown = await lead.agent.get('/api/overdue');
    expect(shown.body.data.every((l: { remindedToday: boolean }) => l.remindedToday)).toBe(true);

    later(60_000);
    expect(await t.deliverMail()).toEqual({ sent: 3, retrying: 0, failed: 0 });
    expect((await t.lastMailTo('member@example.org'))?.subject).toMatch(/^Reminder: T-0001/);
    expect(runOverdueReminders(ctx).remindersSent).toBe(0);
  });
});
