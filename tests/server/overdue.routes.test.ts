import { eq } from 'drizzle-orm';
import { describe, expect } from 'vitest';
import { overdueListSchema, reminderSentSchema } from '@shared/schemas/overdue';
import { users } from '../../server/db/schema/users';
import { crewTest } from '../helpers/crew-test';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { addToolAs, lend, post } from '../helpers/crib';

const DAY_MS = 24 * 60 * 60 * 1000;
const HOUR_MS = 60 * 60 * 1000;

const test = crewTest
  .extend('later', ({ clock }) => (ms: number) => {
    clock.now = new Date(clock.now.getTime() + ms);
  })
  .extend('addTool', ({ qm }) => async (body: Record<string, unknown>) => (await addToolAs(qm, body)).code);

test.beforeEach(({ t, crew }) => {
  t.db.update(users).set({ phone: '555-0100' }).where(eq(users.id, crew.member.id)).run();
});

describe('GET /api/overdue', () => {
  test('lists open loans past due with the holder’s contact, most days late first', async ({ t, lead, qm, member, later, addTool }) => {
    const wrench = await addTool({ name: 'Torque wrench', category: 'torque_wrench', location: 'Cabinet B', replacementValueCents: 25_000 });
    const drill = await addTool({ name: 'Air drill', category: 'air_drill', replacementValueCents: 18_000 });
    const puller = await addTool({ name: 'Hand rivet puller', category: 'hand_rivet_puller' });
    const fan = await addTool({ name: 'Spacing fan', category: 'spacing_fan' });
    // Lent first but due later: the list must follow days late, not the order of the loans.
    const drillLoan = await lend(t, qm, drill, 4 * DAY_MS);
    const wrenchLoan = await lend(t, member, wrench, 1 * DAY_MS);
    await lend(t, member, puller, 30 * DAY_MS);
    await lend(t, member, fan, 1 * DAY_MS);
    await post(member, `/api/tools/${fan}/return`, { condition: 'ok' }).expect(200);
    later(10 * DAY_MS);

    const res = await lead.agent.get('/api/overdue');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(overdueListSchema.parse(res.body).lastRun).toBeNull();
    expect(res.body.data).toEqual([
      {
        loanId: wrenchLoan,
        tool: { code: wrench, name: 'Torque wrench', location: 'Cabinet B', replacementValueCents: 25_000 },
        holder: { id: expect.any(Number), name: 'Mia Member', email: 'member@example.org', phone: '555-0100' },
        dueAt: '2026-12-02T12:00:00.000Z',
        daysLate: 9,
        lastReminderAt: null,
        remindedToday: false,
      },
      expect.objectContaining({ loanId: drillLoan, daysLate: 6, holder: expect.objectContaining({ name: 'Quinn Quartermaster', phone: null }) }),
    ]);
  });

  test('counts whole days late, and a loan less than a day late as 1 day late', async ({ t, lead, member, later, addTool }) => {
    const code = await addTool({ name: 'Deburring tool', category: 'deburring_tool' });
    await lend(t, member, code, 1 * DAY_MS);
    const daysLate = async () => ((await lead.agent.get('/api/overdue')).body.data as { daysLate: number }[]).map((l) => l.daysLate);
    expect(await daysLate()).toEqual([]);
    later(DAY_MS + 3 * HOUR_MS);
    expect(await daysLate()).toEqual([1]);
    later(DAY_MS);
    expect(await daysLate()).toEqual([1]);
    later(21 * HOUR_MS);
    expect(await daysLate()).toEqual([2]);
  });

  test('counts days late in chapter days, whatever the server’s zone', async ({ t, lead, member, addTool }) => {
    writeChapterTimeZone(t.db, 'America/Chicago');
    const code = await addTool({ name: 'Deburring tool', category: 'deburring_tool', loanDays: 1 });
    await post(member, `/api/tools/${code}/checkout`).expect(201); // Tuesday 06:00 in Chicago: due by the end of Wednesday
    const late = async () => ((await lead.agent.get('/api/overdue')).body.data as { daysLate: number; dueAt: string }[]).map((l) => l.daysLate);
    t.clock.now = new Date('2026-12-03T05:30:00Z'); // Wednesday 23:30 in Chicago: not late yet
    expect(await late()).toEqual([]);
    t.clock.now = new Date('2026-12-03T06:30:00Z'); // Thursday 00:30
    expect(await late()).toEqual([1]);
    t.clock.now = new Date('2026-12-04T05:30:00Z'); // Thursday 23:30: still the first day late, though Friday in UTC
    expect(await late()).toEqual([1]);
    t.clock.now = new Date('2026-12-04T06:30:00Z'); // Friday 00:30, barely a day after the due moment: 2 chapter days
    expect(await late()).toEqual([2]);
  });

  test('answers 403 to a member and a quartermaster, and 401 when signed out', async ({ t, qm, member }) => {
    for (const who of [member, qm]) {
      const res = await who.agent.get('/api/overdue');
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    const anonymous = await t.anonymous();
    const res = await anonymous.agent.get('/api/overdue');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
  });
});

describe('POST /api/overdue/:loanId/remind', () => {
  test('e-mails the holder a reminder with the tool, due date, days late, where it lives and a link', async ({ t, lead, member, later, addTool }) => {
    const code = await addTool({ name: 'Torque wrench', category: 'torque_wrench', location: 'Cabinet B, shelf 2' });
    const loanId = await lend(t, member, code, 1 * DAY_MS);
    later(6 * DAY_MS);

    const res = await post(lead, `/api/overdue/${loanId}/remind`);
    expect(res.status).toBe(201);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(reminderSentSchema.parse(res.body)).toEqual({ loanId, sentTo: 'member@example.org', sentAt: t.clock.now.toISOString(), day: '2026-12-07' });
    const mail = await t.lastMailTo('member@example.org');
    expect(mail?.subject).toBe(`Reminder: ${code} Torque wrench was due back on Wednesday, December 2`);
    expect(mail?.text).toContain('Hello Mia Member,');
    expect(mail?.text).toContain('is now 5 days late');
    expect(mail?.text).toContain('It lives at: Cabinet B, shelf 2.');
    expect(mail?.links).toEqual([`http://gripline.test/tools/${code}`]);

    const list = await lead.agent.get('/api/overdue');
    expect(list.body.data[0]).toMatchObject({ loanId, lastReminderAt: t.clock.now.toISOString(), remindedToday: true });
  });

  test('writes the reminder in the chapter’s days: its day, the due day in words and the days late', async ({ t, lead, member, addTool }) => {
    writeChapterTimeZone(t.db, 'Pacific/Auckland');
    const code = await addTool({ name: 'Torque wrench', category: 'torque_wrench', loanDays: 1 });
    const out = await post(member, `/api/tools/${code}/checkout`); // Wednesday 01:00 in Auckland
    expect(out.body.dueAt).toBe('2026-12-03T10:59:59.999Z'); // the end of Thursday, December 3 there
    t.clock.now = new Date('2026-12-05T12:00:00Z'); // Sunday, December 6, 01:00 in Auckland; still Saturday in UTC
    const res = await post(lead, `/api/overdue/${out.body.id}/remind`);
    expect(res.status).toBe(201);
    expect(res.body.day).toBe('2026-12-06');
    const mail = await t.lastMailTo('member@example.org');
    expect(mail?.subject).toBe(`Reminder: ${code} Torque wrench was due back on Thursday, December 3`);
    expect(mail?.text).toContain('It was due back on Thursday, December 3 and is now 3 days late.');
    expect((await lead.agent.get('/api/overdue')).body.data[0]).toMatchObject({ daysLate: 3, remindedToday: true });
  });

  test('sends at most one reminder per loan per day: a second the same day answers 409 REMINDER_ALREADY_SENT, the next day works', async ({ t, lead, member, later, addTool }) => {
    const code = await addTool({ name: 'Air drill', category: 'air_drill' });
    const loanId = await lend(t, member, code, 1 * DAY_MS);
    later(3 * DAY_MS);
    await post(lead, `/api/overdue/${loanId}/remind`).expect(201);
    later(5 * HOUR_MS);
    const again = await post(lead, `/api/overdue/${loanId}/remind`);
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('REMINDER_ALREADY_SENT');
    expect(again.body.error.message).toMatch(/already been reminded.*today/);
    const sent = t.db.$client.prepare('select count(*) as n from loan_reminders where loan_id = ?').get(loanId) as { n: number };
    expect(sent.n).toBe(1);

    later(DAY_MS);
    expect((await post(lead, `/api/overdue/${loanId}/remind`)).status).toBe(201);
    const list = await lead.agent.get('/api/overdue');
    expect(list.body.data[0]).toMatchObject({ remindedToday: true, lastReminderAt: t.clock.now.toISOString() });
  });

  test('answers 409 LOAN_NOT_OVERDUE for a loan not yet due and 409 LOAN_RETURNED for one that came back', async ({ t, lead, member, later, addTool }) => {
    const code = await addTool({ name: 'Rivet gun', category: 'rivet_gun' });
    const loanId = await lend(t, member, code, 2 * DAY_MS);
    const early = await post(lead, `/api/overdue/${loanId}/remind`);
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe('LOAN_NOT_OVERDUE');
    expect(early.body.error.message).toMatch(/not due back until Thursday, December 3;/);

    later(5 * DAY_MS);
    await post(member, `/api/tools/${code}/return`, { condition: 'ok' }).expect(200);
    const returned = await post(lead, `/api/overdue/${loanId}/remind`);
    expect(returned.status).toBe(409);
    expect(returned.body.error.code).toBe('LOAN_RETURNED');
    expect(await t.lastMailTo('member@example.org')).toBeUndefined();
  });

  test('answers 404 LOAN_NOT_FOUND for an unknown loan and 400 VALIDATION_FAILED for a malformed id', async ({ lead }) => {
    const unknown = await post(lead, '/api/overdue/9999/remind');
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe('LOAN_NOT_FOUND');
    for (const bad of ['abc', '0', '-3', '1.5']) {
      const res = await post(lead, `/api/overdue/${bad}/remind`);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
      expect(res.body.error.issues[0].path).toBe('loanId');
      expect(res.body.error.message).toMatch(/The path is not valid/);
    }
  });

  test('answers 403 to a member and a quartermaster', async ({ t, qm, member, later, addTool }) => {
    const code = await addTool({ name: 'Bucking bar', category: 'bucking_bar' });
    const loanId = await lend(t, member, code, 1 * DAY_MS);
    later(2 * DAY_MS);
    for (const who of [member, qm]) {
      const res = await post(who, `/api/overdue/${loanId}/remind`);
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    expect(await t.lastMailTo('member@example.org')).toBeUndefined();
  });
});
