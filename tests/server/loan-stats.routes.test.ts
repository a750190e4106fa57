import { describe, expect } from 'vitest';
import { loanStatsSchema } from '@shared/schemas/loan-stats';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { addToolAs, post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';

const test = crewTest
  .extend('at', ({ clock }) => (iso: string) => {
    clock.now = new Date(iso);
  })
  .extend('addTool', ({ qm }) => async (name: string, category: string) => (await addToolAs(qm, { name, category })).code)
  .extend('checkOut', ({ member }) => (code: string) => post(member, `/api/tools/${code}/checkout`, {}).expect(201))
  .extend('giveBack', ({ member }) => (code: string) => post(member, `/api/tools/${code}/return`, { condition: 'ok' }).expect(200));

describe('GET /api/loans/stats', () => {
  test('counts loans and late days per chapter week, the tools used most and those idle six months', async ({ t, lead, at, addTool, checkOut, giveBack }) => {
    // Chicago: CDT (UTC−5) until November 1, 2026, CST (UTC−6) after; chapter weeks start on Monday there.
    writeChapterTimeZone(t.db, 'America/Chicago');
    at('2026-05-01T15:00:00Z');
    const puller = await addTool('Hand rivet puller', 'hand_rivet_puller'); // 14-day loans
    const gun = await addTool('Rivet gun, 2X', 'rivet_gun'); // 7-day loans
    const fan = await addTool('Rivet spacing fan', 'spacing_fan'); // never lent
    const bar = await addTool('Bucking bar', 'bucking_bar'); // lent once, in May
    const wrench = await addTool('Torque wrench', 'torque_wrench'); // 3-day loans
    at('2026-11-01T15:00:00Z');
    await addTool('Edge distance marker', 'measuring'); // never lent, but only a month in the crib

    at('2026-05-10T15:00:00Z');
    await checkOut(bar);
    at('2026-05-12T15:00:00Z');
    await giveBack(bar);
    // The window's first week starts Monday, June 8, 00:00 CDT = 05:00Z: the loan at 04:30Z (Sunday 23:30) is before it.
    at('2026-06-08T04:30:00Z');
    await checkOut(puller);
    at('2026-06-08T04:45:00Z');
    await giveBack(puller);
    at('2026-06-08T05:30:00Z'); // Monday 00:30 CDT: the first week's first loan, back the same day (1 day out)
    await checkOut(puller);
    at('2026-06-08T06:00:00Z');
    await giveBack(puller);
    // Tuesday, November 17, 10:00 CST: due by the end of Tuesday, November 24; back Wednesday, December 2.
    at('2026-11-17T16:00:00Z');
    await checkOut(gun);
    // Thursday, November 26, 14:00 CST: due by the end of Sunday, November 29; still out.
    at('2026-11-26T20:00:00Z');
    await checkOut(wrench);
    // Sunday, November 29, 21:00 CST, though Monday in UTC: the week of November 23. Back Monday 01:00 (1 day out).
    at('2026-11-30T03:00:00Z');
    await checkOut(puller);
    at('2026-11-30T07:00:00Z');
    await giveBack(puller);
    at('2026-12-02T15:00:00Z'); // Wednesday 09:00 CST
    await giveBack(gun);
    at('2026-12-02T18:00:00Z'); // now: Wednesday, December 2, 12:00 CST

    const res = await lead.agent.get('/api/loans/stats');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    const stats = loanStatsSchema.parse(res.body);

    // 26 Mondays: November 30 (this week) back 25 weeks is June 8.
    expect(stats.weeks).toHaveLength(26);
    expect(stats.weeks[0]!.start).toBe('2026-06-08');
    expect(stats.weeks[23]!.start).toBe('2026-11-16');
    expect(stats.weeks.at(-1)!.start).toBe('2026-11-30');
    expect(stats.kinds).toEqual(['hand_rivet_puller', 'rivet_gun', 'torque_wrench']);
    const week = (start: string) => stats.weeks.find((w) => w.start === start);
    // June 8: the puller's 00:30 loan only (the 23:30 one was the Sunday before).
    expect(week('2026-06-08')).toEqual({ start: '2026-06-08', byKind: { hand_rivet_puller: 1, rivet_gun: 0, torque_wrench: 0 }, total: 1, overdueDays: 0 });
    // November 16: the gun, taken Tuesday the 17th.
    expect(week('2026-11-16')).toEqual({ start: '2026-11-16', byKind: { hand_rivet_puller: 0, rivet_gun: 1, torque_wrench: 0 }, total: 1, overdueDays: 0 });
    // November 23: the wrench (Thursday) and the puller (Sunday night in Chicago). Late days: the gun's
    // Wednesday 25 to Sunday 29 = 5 (due the end of Tuesday 24); the wrench is not late until Monday 30.
    expect(week('2026-11-23')).toEqual({ start: '2026-11-23', byKind: { hand_rivet_puller: 1, rivet_gun: 0, torque_wrench: 1 }, total: 2, overdueDays: 5 });
    // November 30: no loans. Late days: the gun's Monday 30, Tuesday 1 and Wednesday 2 (back that morning,
    // 8 days late in all = 5 + 3) and the wrench's Monday 30 to today, Wednesday 2 = 3: 6.
    expect(week('2026-11-30')).toEqual({ start: '2026-11-30', byKind: { hand_rivet_puller: 0, rivet_gun: 0, torque_wrench: 0 }, total: 0, overdueDays: 6 });
    expect(stats.weeks.reduce((s, w) => s + w.total, 0)).toBe(4);
    // The gun's 8 late days and the wrench's 3.
    expect(stats.weeks.reduce((s, w) => s + w.overdueDays, 0)).toBe(11);

    // The open wrench's 3 late days this week are the Overdue page's figure for it.
    const overdue = (await lead.agent.get('/api/overdue')).body as { data: { tool: { code: string }; daysLate: number }[] };
    expect(overdue.data.map((l) => [l.tool.code, l.daysLate])).toEqual([[wrench, 3]]);

    // Puller: 2 loans in the window, 1 day out each. Gun: November 17 to December 2 = 15 days. Wrench: November 26 to today = 6.
    expect(stats.mostUsed).toEqual([
      { code: puller, name: 'Hand rivet puller', category: 'hand_rivet_puller', loans: 2, daysOut: 2 },
      { code: gun, name: 'Rivet gun, 2X', category: 'rivet_gun', loans: 1, daysOut: 15 },
      { code: wrench, name: 'Torque wrench', category: 'torque_wrench', loans: 1, daysOut: 6 },
    ]);

    // Six months before Wednesday, December 2, 12:00 CST is Tuesday, June 2, 12:00 CDT.
    expect(stats.idleSince).toBe('2026-06-02T17:00:00.000Z');
    // The fan never went out (first), the bar last went out in May; the marker is too new to judge.
    expect(stats.idle).toEqual([
      { code: fan, name: 'Rivet spacing fan', category: 'spacing_fan', status: 'available', lastLentAt: null, addedAt: '2026-05-01T15:00:00.000Z' },
      { code: bar, name: 'Bucking bar', category: 'bucking_bar', status: 'available', lastLentAt: '2026-05-10T15:00:00.000Z', addedAt: '2026-05-01T15:00:00.000Z' },
    ]);
  });

  test('leaves lost and retired tools out of the idle ones: they are no longer the crib’s to sell or move', async ({ lead, qm, at, addTool }) => {
    at('2026-01-05T15:00:00Z');
    const kept = await addTool('Fluting pliers', 'other');
    const lost = await addTool('Edge deburring tool', 'deburring_tool');
    at('2026-12-01T12:00:00Z');
    await post(qm, `/api/tools/${lost}/lost`, { note: 'Not in the drawer at the count' }).expect(200);
    const stats = loanStatsSchema.parse((await lead.agent.get('/api/loans/stats').expect(200)).body);
    expect(stats.idle.map((i) => i.code)).toEqual([kept]);
    expect(stats.kinds).toEqual([]);
    expect(stats.mostUsed).toEqual([]);
  });

  test('is for the lead only', async ({ t, qm, member }) => {
    expect((await member.agent.get('/api/loans/stats')).status).toBe(403);
    expect((await qm.agent.get('/api/loans/stats')).status).toBe(403);
    const anonymous = await t.anonymous();
    expect((await anonymous.agent.get('/api/loans/stats')).status).toBe(401);
  });
});
