import { describe, expect, onTestFinished } from 'vitest';
import { leadTodaySchema, type LeadToday } from '@shared/schemas/today-lead';
import { addBinAs, addToolAs, blindRivetBin, lend, post } from '../helpers/crib';
import { addAssembly, DAY_MS, drawFrom, hundredRivetLine } from '../helpers/planning-fixture';
import { DEMO_PASSWORD, seedDemoChapter } from '../../server/seed/demo-chapter';
import { crewTest } from '../helpers/crew-test';
import { buildTestApp } from '../helpers/test-app';

// The test clock starts on Tuesday 2026-12-01 at 12:00 UTC.
const test = crewTest
  .extend('today', ({ lead }) => async (): Promise<LeadToday> => {
    const res = await lead.agent.get('/api/today/lead');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    return leadTodaySchema.parse(res.body);
  })
  .extend('at', ({ t }) => (iso: string) => {
    t.clock.now = new Date(iso);
  });

describe('GET /api/today/lead', () => {
  test('says there is nothing to do in an empty chapter', async ({ today }) => {
    expect(await today()).toEqual({
      overdue: { total: 0, loans: [] },
      onLoan: { toolCount: 0, valueCents: 0 },
      holders: { total: 0, people: [] },
      reorder: { toOrder: 0 },
      signoffRequests: { total: 0, requests: [] },
      spend: { thisMonth: { month: '2026-12', consumedCents: 0 }, lastMonth: { month: '2026-11', consumedCents: 0 } },
    });
  });

  test('lists overdue loans, the value out on loan, who holds what, reorder alerts, sign-off requests and the spend', async ({ t, lead, qm, member, today, at }) => {
    // Last month: 100 rivets drawn at $0.12.
    at('2026-11-10T12:00:00Z');
    const bin = await addBinAs(qm, blindRivetBin({ diameter32: 5, initialQuantity: 500 }));
    await drawFrom(member, bin.code, 100);
    const wrench = (await addToolAs(qm, { name: 'Torque wrench', category: 'torque_wrench', replacementValueCents: 25_000 })).code;
    const squeezer = (await addToolAs(qm, { name: 'Hand squeezer', category: 'other', replacementValueCents: 18_000 })).code;
    const fan = (await addToolAs(qm, { name: 'Spacing fan', category: 'spacing_fan', replacementValueCents: 4_500 })).code;
    const wrenchLoan = await lend(t, member, wrench, 5 * DAY_MS); // due Nov 15: 16 days late on Dec 1
    await lend(t, member, fan, 30 * DAY_MS);
    // This month: 50 more, and a loan to the quartermaster due tomorrow.
    at('2026-12-01T12:00:00Z');
    await drawFrom(member, bin.code, 50);
    await lend(t, qm, squeezer, DAY_MS);
    // A bin running low raises a reorder alert.
    const low = await addBinAs(qm, blindRivetBin({ initialQuantity: 100, leadTimeDays: 14, reorderPoint: 0 }));
    await addAssembly(member, { name: `Rib bay for ${low.code}`, plannedStart: '2026-12-01', plannedFinish: '2026-12-06', lines: [hundredRivetLine] });
    expect((await post(qm, '/api/alerts/refresh')).body.raised).toBeGreaterThanOrEqual(1);
    // A sign-off request from the member.
    const signoff = (await post(lead, '/api/signoffs', { name: 'Air tools' })).body as { id: number };
    const drill = (await addToolAs(qm, { name: 'Air drill', category: 'air_drill', requiredSignoffId: signoff.id })).code;
    expect((await post(member, '/api/signoffs/requests', { toolCode: drill, note: 'Did the course' })).status).toBe(201);

    const answer = await today();
    expect(answer.overdue.total).toBe(1);
    expect(answer.overdue.loans).toEqual([
      expect.objectContaining({ loanId: wrenchLoan, daysLate: 16, remindedToday: false, tool: expect.objectContaining({ code: wrench }), holder: expect.objectContaining({ name: 'Mia Member' }) }),
    ]);
    expect(answer.onLoan).toEqual({ toolCount: 3, valueCents: 25_000 + 18_000 + 4_500 });
    expect(answer.holders).toEqual({
      total: 2,
      people: [
        { id: expect.any(Number), name: 'Mia Member', toolCount: 2, firstDueAt: '2026-11-15T12:00:00.000Z', firstDueWords: '16 days late', overdue: true },
        { id: expect.any(Number), name: 'Quinn Quartermaster', toolCount: 1, firstDueAt: '2026-12-02T12:00:00.000Z', firstDueWords: 'due tomorrow', overdue: false },
      ],
    });
    expect(answer.reorder.toOrder).toBe((await qm.agent.get('/api/alerts?state=open')).body.data.length);
    expect(answer.reorder.toOrder).toBeGreaterThanOrEqual(1);
    expect(answer.signoffRequests).toEqual({
      total: 1,
      requests: [expect.objectContaining({ signoff: { id: signoff.id, name: 'Air tools' }, member: expect.objectContaining({ name: 'Mia Member' }), tool: { code: drill, name: 'Air drill' }, note: 'Did the course', state: 'open' })],
    });
    expect(answer.spend).toEqual({ thisMonth: { month: '2026-12', consumedCents: 600 }, lastMonth: { month: '2026-11', consumedCents: 1200 } });
    // The same figures as the Spend page.
    const spend = (await lead.agent.get('/api/stock/spend?months=2')).body as { months: { month: string; consumedCents: number }[] };
    expect(spend.months.map((m) => m.consumedCents)).toEqual([1200, 600]);
  });

  test('shows a reminder sent from home as sent today', async ({ t, lead, qm, member, today, at }) => {
    const code = (await addToolAs(qm, { name: 'Deburring tool', category: 'deburring_tool' })).code;
    const loanId = await lend(t, member, code, DAY_MS);
    at('2026-12-05T12:00:00Z');
    expect((await today()).overdue.loans[0]).toMatchObject({ loanId, remindedToday: false });
    expect((await post(lead, `/api/overdue/${loanId}/remind`)).status).toBe(201);
    expect((await today()).overdue.loans[0]).toMatchObject({ loanId, remindedToday: true });
  });

  test('lists at most five of each, with the totals', async ({ t, qm, today, at }) => {
    for (let i = 0; i < 7; i++) {
      const who = await t.addUser({ email: `m${i}@example.org`, name: `Member ${i}` });
      const agent = await t.signIn(who.email);
      const code = (await addToolAs(qm, { name: `Deburring tool ${i}`, category: 'deburring_tool' })).code;
      await lend(t, agent, code, DAY_MS);
    }
    at('2026-12-09T12:00:00Z');
    const answer = await today();
    expect(answer.overdue.total).toBe(7);
    expect(answer.overdue.loans).toHaveLength(5);
    expect(answer.holders.total).toBe(7);
    expect(answer.holders.people).toHaveLength(5);
  });

  test('refuses a quartermaster and a member with 403, and a signed-out visitor with 401', async ({ t, qm, member }) => {
    for (const who of [qm, member]) {
      const res = await who.agent.get('/api/today/lead');
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    expect((await (await t.anonymous()).agent.get('/api/today/lead')).status).toBe(401);
  });
});

describe('GET /api/today/lead on the demo chapter', () => {
  test('shows the demo’s real work: its two overdue loans, the tools out and with whom, bins to order, two sign-off requests and the spend', async () => {
    const demo = await buildTestApp();
    onTestFinished(() => demo.close());
    expect(await seedDemoChapter(demo.db)).toBe(true);
    demo.clock.now = new Date();
    const dana = await demo.signIn('lead@example.org', DEMO_PASSWORD);
    const get = async (path: string): Promise<Record<string, unknown>> => (await dana.agent.get(path).expect(200)).body as Record<string, unknown>;
    const answer = leadTodaySchema.parse(await get('/api/today/lead'));

    const overdue = (await get('/api/overdue')).data as { loanId: number; holder: { name: string } }[];
    expect(overdue).toHaveLength(2);
    expect(answer.overdue.total).toBe(2);
    expect(answer.overdue.loans.map((l) => l.loanId)).toEqual(overdue.map((l) => l.loanId));
    expect(answer.overdue.loans.map((l) => l.holder.name).sort()).toEqual(['Ines Parra', 'Kelechi Obi']);

    const open = (await get('/api/loans/open')).data as { holder: { name: string }; tool: { code: string } }[];
    expect(answer.onLoan.toolCount).toBe(open.length);
    const tools = (await get('/api/tools?pageSize=100')).data as { code: string; replacementValueCents: number }[];
    const value = open.reduce((sum, l) => sum + tools.find((x) => x.code === l.tool.code)!.replacementValueCents, 0);
    expect(answer.onLoan.valueCents).toBe(value);
    expect(value).toBeGreaterThan(0);
    expect(answer.holders.total).toBe(new Set(open.map((l) => l.holder.name)).size);
    expect(answer.holders.people.find((p) => p.name === 'Marco Bellweather')).toMatchObject({ toolCount: 2 });
    expect(answer.holders.people.find((p) => p.name === 'Kelechi Obi')).toMatchObject({ toolCount: 1, overdue: true });

    const toOrder = (await get('/api/alerts?state=open')).data as unknown[];
    expect(toOrder.length).toBeGreaterThanOrEqual(1);
    expect(answer.reorder.toOrder).toBe(toOrder.length);

    expect(answer.signoffRequests.total).toBe(2);
    expect(answer.signoffRequests.requests.map((r) => `${r.member.name}: ${r.signoff.name}`)).toEqual(['Kelechi Obi: Air tools', 'Marco Bellweather: Rivet gun and bucking']);

    const spend = (await get('/api/stock/spend?months=2')).months as { month: string; consumedCents: number }[];
    const used = ({ month, consumedCents }: { month: string; consumedCents: number }) => ({ month, consumedCents });
    expect(answer.spend).toEqual({ lastMonth: used(spend[0]!), thisMonth: used(spend[1]!) });
    expect(spend[0]!.consumedCents + spend[1]!.consumedCents).toBeGreaterThan(0);
  }, 30_000);
});
