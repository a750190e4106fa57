import { describe, expect } from 'vitest';
import { serviceDueListSchema } from '@shared/schemas/overdue';
import { crewTest } from '../helpers/crew-test';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { addToolAs, post } from '../helpers/crib';

const DAY_MS = 24 * 60 * 60 * 1000;

/** Yearly calibration of a torque wrench: common practice; the wrench's maker may say otherwise. */
const wrench = (name: string, lastServiceAt: string) => ({ name, category: 'torque_wrench', serviceIntervalDays: 365, lastServiceAt });

const test = crewTest
  .extend('daysAgo', ({ t }) => (n: number) => new Date(t.clock.now.getTime() - n * DAY_MS).toISOString())
  .extend('addTool', ({ qm }) => async (body: Record<string, unknown>) => (await addToolAs(qm, body)).code);

describe('GET /api/service-due', () => {
  test('counts the days to a calibration in chapter days: due tomorrow 01:00 in the chapter is due in 1 day, not today', async ({ t, qm, addTool }) => {
    writeChapterTimeZone(t.db, 'America/Chicago'); // now: Tuesday 06:00 there
    const hours = (n: number) => new Date(t.clock.now.getTime() - 365 * DAY_MS + n * 60 * 60 * 1000).toISOString();
    const code = await addTool(wrench('Torque wrench, 1/2 drive', hours(19))); // due Wednesday 01:00 in Chicago, 19 hours on
    const late = await addTool(wrench('Torque wrench, 3/8 drive', hours(-7))); // due Monday 23:00 there, 7 hours ago
    const res = await qm.agent.get('/api/service-due');
    const item = (c: string) => (res.body.data as { code: string; daysUntilDue: number; words: string }[]).find((i) => i.code === c);
    expect(item(code)).toMatchObject({ daysUntilDue: 1, words: 'Calibration due in 1 day' });
    expect(item(late)).toMatchObject({ daysUntilDue: -1, words: 'Calibration overdue by 1 day' });
  });

  test('lists a torque wrench due within 14 days but not one serviced yesterday', async ({ t, qm, daysAgo, addTool }) => {
    const due = await addTool(wrench('Torque wrench, 1/4 drive', daysAgo(360)));
    await addTool(wrench('Torque wrench, 3/8 drive', daysAgo(1)));
    const res = await qm.agent.get('/api/service-due');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(serviceDueListSchema.parse(res.body).meta).toEqual({ dueWithinDays: 14 });
    expect(res.body.data).toEqual([
      {
        code: due,
        name: 'Torque wrench, 1/4 drive',
        category: 'torque_wrench',
        location: '',
        status: 'available',
        outOfServiceReason: null,
        serviceKind: 'calibration',
        serviceIntervalDays: 365,
        lastServiceAt: daysAgo(360),
        serviceDueAt: new Date(t.clock.now.getTime() + 5 * DAY_MS).toISOString(),
        daysUntilDue: 5,
        urgency: 'due_soon',
        missingAccessories: [],
        words: 'Calibration due in 5 days',
      },
    ]);
  });

  test('puts overdue service first, then tools out of service with their reason, then those due soon', async ({ qm, daysAgo, addTool }) => {
    const soon = await addTool(wrench('Torque wrench, due soon', daysAgo(355)));
    const broken = await addTool({ name: 'Rivet gun', category: 'rivet_gun' });
    await post(qm, `/api/tools/${broken}/out-of-service`, { note: 'Trigger sticks' }).expect(200);
    const late = await addTool(wrench('Torque wrench, late', daysAgo(377)));
    const drill = await addTool({ name: 'Air drill', category: 'air_drill', serviceIntervalDays: 180, lastServiceAt: daysAgo(182) });

    const res = await qm.agent.get('/api/service-due');
    expect(res.body.data.map((i: { code: string; urgency: string; words: string }) => [i.code, i.urgency, i.words])).toEqual([
      [late, 'overdue', 'Calibration overdue by 12 days'],
      [drill, 'overdue', 'Service overdue by 2 days'],
      [broken, 'out_of_service', 'Out of service: Trigger sticks'],
      [soon, 'due_soon', 'Calibration due in 10 days'],
    ]);
    expect(res.body.data[2]).toMatchObject({ outOfServiceReason: 'Trigger sticks', status: 'out_of_service', daysUntilDue: null });
  });

  test('leaves out retired and lost tools', async ({ qm, daysAgo, addTool }) => {
    const retired = await addTool(wrench('Old torque wrench', daysAgo(400)));
    await post(qm, `/api/tools/${retired}/retire`, { note: 'Worn ratchet' }).expect(200);
    const lost = await addTool(wrench('Missing torque wrench', daysAgo(400)));
    await post(qm, `/api/tools/${lost}/lost`, { note: 'Not seen since the fly-in' }).expect(200);
    expect((await qm.agent.get('/api/service-due')).body.data).toEqual([]);
  });

  test('drops a tool once it is back in service and serviced, but keeps an overdue one brought back without service', async ({ t, qm, daysAgo, addTool }) => {
    const code = await addTool(wrench('Torque wrench, 1/2 drive', daysAgo(370)));
    await post(qm, `/api/tools/${code}/out-of-service`, { note: 'Sent for calibration' }).expect(200);
    let list = await qm.agent.get('/api/service-due');
    expect(list.body.data[0]).toMatchObject({ code, status: 'out_of_service', words: 'Out of service: Sent for calibration; Calibration overdue by 5 days' });

    await post(qm, `/api/tools/${code}/back-in-service`, { note: 'Not calibrated yet', serviced: false }).expect(200);
    list = await qm.agent.get('/api/service-due');
    expect(list.body.data[0]).toMatchObject({ code, status: 'available', words: 'Calibration overdue by 5 days' });

    await post(qm, `/api/tools/${code}/out-of-service`, { note: 'Sent for calibration' }).expect(200);
    const back = await post(qm, `/api/tools/${code}/back-in-service`, { note: 'Calibrated, certificate filed', serviced: true });
    expect(back.status).toBe(200);
    expect((await qm.agent.get('/api/service-due')).body.data).toEqual([]);
    const tool = await qm.agent.get(`/api/tools/${code}`);
    expect(tool.body.lastServiceAt).toBe(t.clock.now.toISOString());
  });

  test('lets the lead read it, answers 403 to a member and 401 when signed out', async ({ t, lead, member }) => {
    expect((await lead.agent.get('/api/service-due')).status).toBe(200);
    const refused = await member.agent.get('/api/service-due');
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('FORBIDDEN');
    const anonymous = await (await t.anonymous()).agent.get('/api/service-due');
    expect(anonymous.status).toBe(401);
    expect(anonymous.body.error.code).toBe('NOT_SIGNED_IN');
  });
});
