import { describe, expect } from 'vitest';
import { binForecast } from '@shared/forecast/bin-forecast';
import { forecastListSchema, type BinForecastDto } from '@shared/schemas/forecast';
import { crewTest } from '../helpers/crew-test';
import { addBinAs, blindRivetBin, post } from '../helpers/crib';
import { addAssembly, drawFrom, hundredRivetLine, screwBin } from '../helpers/planning-fixture';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';

// The test clock: Tuesday 2026-12-01 12:00 UTC, so week 0 starts Monday 2026-11-30.
const test = crewTest
  .extend('at', ({ clock }) => (iso: string) => {
    clock.now = new Date(iso);
  })
  .extend('forecastOf', ({ qm }) => async (code: string): Promise<BinForecastDto> => {
    const res = await qm.agent.get(`/api/forecast?bins=${code}`);
    expect(res.status).toBe(200);
    const body = forecastListSchema.parse(res.body);
    expect(body.data).toHaveLength(1);
    return body.data[0]!;
  });

describe('GET /api/forecast', () => {
  test('counts weeks on the chapter’s calendar: week 0 is the chapter week holding now, and draws fall in the chapter week they were made', async ({ t, qm, member, at, forecastOf }) => {
    writeChapterTimeZone(t.db, 'Pacific/Auckland');
    at('2026-11-10T12:00:00Z');
    const bin = await addBinAs(qm, blindRivetBin({ reorderPoint: 0, initialQuantity: 1000, leadTimeDays: 14, unitCost: 0.05 }));
    at('2026-11-29T12:30:00Z'); // Monday, November 30, 01:30 in Auckland: this week, not last week's history
    await drawFrom(member, bin.code, 40);
    at('2026-11-29T10:00:00Z'); // Sunday 23:00 in Auckland: last week
    await drawFrom(member, bin.code, 26);
    at('2026-12-06T12:00:00Z'); // Monday, December 7, 01:00 in Auckland; still Sunday in UTC
    const f = await forecastOf(bin.code);
    expect(f.weeks[0]).toBe('2026-12-07');
    expect(f.weeks[1]).toBe('2026-12-14');
    expect(f.demandSource).toBe('history');
    // The last full chapter week (Nov 30 – Dec 6) holds the 40; the one before it the 26: 66 over 26 weeks.
    expect(f.weeklyDemand[0]).toBeCloseTo(66 / 26, 2);
  });

  test('forecasts a bin nobody plans from its weekly draws, net of returns and reversals', async ({ qm, member, at, forecastOf }) => {
    at('2026-10-01T12:00:00Z');
    const bin = await addBinAs(qm, blindRivetBin({ reorderPoint: 0, initialQuantity: 1000, leadTimeDays: 14, unitCost: 0.05 }));
    // Six past weeks of draws: 10, 14, 8, 12 (20 drawn, 8 back), 6 (a 50 reversed the same week), 10.
    for (const [day, quantity] of [['2026-10-20', 10], ['2026-10-27', 14], ['2026-11-03', 8], ['2026-11-10', 20], ['2026-11-17', 6], ['2026-11-24', 10]] as const) {
      at(`${day}T10:00:00Z`);
      await drawFrom(member, bin.code, quantity);
    }
    at('2026-11-11T10:00:00Z');
    expect((await post(member, `/api/bins/${bin.code}/return`, { quantity: 8 })).status).toBe(201);
    at('2026-11-18T10:00:00Z');
    const mistake = await drawFrom(member, bin.code, 50);
    expect((await post(qm, `/api/bins/${bin.code}/ledger/${mistake}/reverse`, { note: 'wrong bin' })).status).toBe(201);
    // This week's draw is not history yet: only full weeks count.
    at('2026-12-01T09:00:00Z');
    await drawFrom(member, bin.code, 30);
    at('2026-12-01T12:00:00Z');

    const f = await forecastOf(bin.code);
    expect(f.weeks).toHaveLength(26);
    expect(f.weeks[0]).toBe('2026-11-30');
    expect(f.weeks[25]).toBe('2027-05-24');
    expect(f.demandSource).toBe('history');
    expect(f.bin).toMatchObject({ code: bin.code, onHand: 910, leadTimeDays: 14, packSize: 100, unitCost: 0.05 });
    // 60 drawn over 26 weeks: 2.3077 a week, every week.
    expect(f.weeklyDemand).toEqual(new Array(26).fill(2.31));
    expect(f.projected[0]).toBeCloseTo(910 - 60 / 26, 2);
    expect(f.projected[25]).toBeCloseTo(850, 2);
    // Worked by hand: 20 zero weeks and 10, 14, 8, 12, 6, 10. Σx² = 640, n·mean² = 3600/26,
    // sample variance (640 − 138.46) / 25 = 20.06, σ = 4.479. z(95 %) = 1.6449 (exact inverse normal;
    // tables give 1.65), L = 2 weeks: safety stock 1.6449 × 4.479 × √2 = 10.42 → 11;
    // reorder point 2 × 2.3077 + 10.42 = 15.03 → 16.
    expect(f.sigmaWeekly).toBeCloseTo(4.479, 3);
    expect(f.z).toBeCloseTo(1.6449, 4);
    expect(f.leadTimeWeeks).toBe(2);
    expect(f.leadTimeDemand).toBeCloseTo(4.62, 2);
    expect(f.safetyStock).toBe(11);
    expect(f.reorderPoint).toBe(16);
    expect(f.needsAlert).toBe(false);

    const history = [...new Array<number>(20).fill(0), 10, 14, 8, 12, 6, 10];
    const same = binForecast({ onHand: 910, leadTimeDays: 14, packSize: 100, unitCost: 0.05, weeklyPlanned: null, history, orderCost: 15, holdingRate: 0.25 });
    expect(f).toMatchObject({ safetyStock: same.safetyStock, reorderPoint: same.reorderPoint, suggestedOrder: same.suggestedOrder, reason: same.reason });
    expect(f.eoq).toBeCloseTo(same.eoq, 1);
  });

  test('spreads what planned and in-progress assemblies still need over their weeks, less what was drawn for them', async ({ qm, member, forecastOf }) => {
    const rivets = await addBinAs(qm, blindRivetBin({ reorderPoint: 0 }));
    const screws = await addBinAs(qm, screwBin());
    // 105 rivets (100 + 5 % waste) and 24 screws over weeks 1–3 (Mon 2026-12-07 to Sun 2026-12-27).
    const wing = await addAssembly(member, {
      name: 'Left wing rib bay',
      plannedStart: '2026-12-07',
      plannedFinish: '2026-12-27',
      lines: [hundredRivetLine],
      extraItems: [{ binCode: screws.code, quantity: 24 }],
    });
    // In progress without dates: all of it now. Done: not demand any more.
    await addAssembly(member, { name: 'Tool chest lid', status: 'in_progress', extraItems: [{ binCode: screws.code, quantity: 10 }] });
    await addAssembly(member, { name: 'Rudder', status: 'done', lines: [hundredRivetLine], extraItems: [{ binCode: screws.code, quantity: 50 }] });
    await drawFrom(member, rivets.code, 15, wing);

    const r = await forecastOf(rivets.code);
    expect(r.demandSource).toBe('planned');
    // (105 − 15) / 3 weeks = 30 a week.
    expect(r.weeklyDemand.slice(0, 5)).toEqual([0, 30, 30, 30, 0]);
    expect(r.weeklyDemand.slice(4).every((x) => x === 0)).toBe(true);
    expect(r.projected.slice(0, 5)).toEqual([485, 455, 425, 395, 395]);
    expect(r.projected[25]).toBe(395);
    // Lead time 10 days = 1.43 weeks: week 0 (nothing) and 3/7 of week 1: 30 × 3/7 = 12.86.
    expect(r.leadTimeDemand).toBeCloseTo(12.86, 2);
    // This week's draw is not history yet, so σ = 0 and there is no safety stock.
    expect(r.sigmaWeekly).toBe(0);
    expect(r.safetyStock).toBe(0);
    expect(r.reorderPoint).toBe(13);
    const planned = [0, 30, 30, 30, ...new Array<number>(22).fill(0)];
    const same = binForecast({ onHand: 485, leadTimeDays: 10, packSize: 100, unitCost: 0.12, weeklyPlanned: planned, history: [], orderCost: 15, holdingRate: 0.25 });
    expect(r).toMatchObject({ safetyStock: same.safetyStock, reorderPoint: same.reorderPoint, suggestedOrder: same.suggestedOrder, needsAlert: same.needsAlert, reason: same.reason });

    const s = await forecastOf(screws.code);
    expect(s.demandSource).toBe('planned');
    expect(s.weeklyDemand.slice(0, 5)).toEqual([10, 8, 8, 8, 0]);
    expect(s.projected.slice(0, 5)).toEqual([190, 182, 174, 166, 166]);
  });

  test('answers every bin in code order with the settings it used', async ({ lead, qm }) => {
    await addBinAs(qm, blindRivetBin({ reorderPoint: 0 }));
    await addBinAs(qm, screwBin());
    const res = await lead.agent.get('/api/forecast');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    const body = forecastListSchema.parse(res.body);
    expect(body.data.map((f) => f.bin.code)).toEqual(['B-0001', 'B-0002']);
    expect(body.meta).toEqual({ generatedAt: '2026-12-01T12:00:00.000Z', serviceLevel: 0.95, horizonWeeks: 26 });
    // No plan and no history: nothing to order, and no alert for an idle bin.
    expect(body.data[0]).toMatchObject({ demandSource: 'history', reorderPoint: 0, safetyStock: 0, suggestedOrder: 0, needsAlert: false });
  });

  test('keeps the reorder point typed on a bin as a floor, so a low bin on the Restock list is also alerted', async ({ qm }) => {
    // No draws, so the computed reorder point is 0; the bin's own is 200 and it holds 150.
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 150, reorderPoint: 200, reorderQty: 450, packSize: 100 }));
    const f = forecastListSchema.parse((await qm.agent.get(`/api/forecast?bins=${bin.code}`)).body).data[0]!;
    expect(f).toMatchObject({ reorderPoint: 200, needsAlert: true, suggestedOrder: 500, reason: 'On hand 150 is at or below the bin\'s own reorder point 200' });
    const raised = await post(qm, '/api/alerts/refresh');
    expect(raised.body.data.map((a: { bin: { code: string } }) => a.bin.code)).toEqual([bin.code]);
  });

  test('names unknown bins with 404 and refuses badly written codes with 400', async ({ qm }) => {
    await addBinAs(qm, blindRivetBin({ reorderPoint: 0 }));
    const unknown = await qm.agent.get('/api/forecast?bins=B-0001,B-9999');
    expect(unknown.status).toBe(404);
    expect(unknown.body.error).toMatchObject({ code: 'BIN_NOT_FOUND', message: expect.stringContaining('B-9999') });
    const bad = await qm.agent.get('/api/forecast?bins=rivets');
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('VALIDATION_FAILED');
    expect(bad.body.error.message).toContain('A bin code looks like B-0107');
  });

  test('is for quartermasters and leads only', async ({ t, member }) => {
    const res = await member.agent.get('/api/forecast');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('FORBIDDEN');
    const anonymous = await t.anonymous();
    expect((await anonymous.agent.get('/api/forecast')).status).toBe(401);
  });
});
