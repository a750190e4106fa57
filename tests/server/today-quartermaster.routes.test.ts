import { describe, expect } from 'vitest';
import { purchaseListSchema } from '@shared/schemas/forecast';
import { quartermasterTodaySchema, type QuartermasterToday } from '@shared/schemas/today-quartermaster';
import { DEMO_PASSWORD, seedDemoChapter } from '../../server/seed/demo-chapter';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { addBinAs, addToolAs, blindRivetBin, post } from '../helpers/crib';
import { dataSnapshot } from '../helpers/db-snapshot';
import { DAY_MS, screwBin } from '../helpers/planning-fixture';
import { crewTest } from '../helpers/crew-test';
import { buildTestApp } from '../helpers/test-app';

// Today is Tuesday 2026-12-01 in the chapter (UTC); the setup happens at earlier moments.
const TODAY = new Date('2026-12-01T12:00:00Z');

const ok = async (res: Promise<{ status: number; body: unknown }> | { status: number; body: unknown }, status = 200) => {
  const r = await res;
  expect(r.status, JSON.stringify(r.body)).toBe(status);
  return r.body as { id: number };
};

const test = crewTest
  .extend('at', ({ t }) => (day: string, hour = 12) => (t.clock.now = new Date(`${day}T${String(hour).padStart(2, '0')}:00:00Z`)))
  .extend('today', ({ qm }) => async (who = qm): Promise<QuartermasterToday> => {
    const res = await who.agent.get('/api/today/quartermaster');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    return quartermasterTodaySchema.parse(res.body);
  });

test.beforeEach(({ t }) => {
  writeChapterTimeZone(t.db, 'UTC');
});

describe('GET /api/today/quartermaster', () => {
  test('is for quartermasters and leads: 403 for a member, 401 signed out', async ({ t, lead, member }) => {
    const refused = await member.agent.get('/api/today/quartermaster');
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('FORBIDDEN');
    expect((await (await t.anonymous()).agent.get('/api/today/quartermaster')).status).toBe(401);
    expect((await lead.agent.get('/api/today/quartermaster')).status).toBe(200);
  });

  test('says there is nothing to do in an empty chapter', async ({ today }) => {
    expect(await today()).toEqual({
      toOrder: { bins: 0, totalCents: 0, top: [] },
      deliveries: { withinDays: 7, expected: [], late: [] },
      returnsNeedingAttention: [],
      missingAccessories: [],
      serviceDue: { withinDays: 14, total: 0, top: [] },
      binsToCount: { rule: expect.stringMatching(/^Of the 10 bins that have gone longest without a count \(never counted ones first\), the 5 holding the most stock by value\.$/), bins: [] },
      writeOffs: { withinDays: 14, entries: [] },
    });
  });

  test('lists what to order from the purchase list, orders due within 7 days and late ones, and writes nothing', async ({ t, qm, at, today }) => {
    at('2026-11-20');
    const late = await addBinAs(qm, blindRivetBin({ initialQuantity: 100 }));
    const soon = await addBinAs(qm, blindRivetBin({ diameter32: 5, initialQuantity: 100 }));
    const far = await addBinAs(qm, screwBin({ reorderPoint: 100, reorderQty: 200, initialQuantity: 50 }));
    const waiting = await addBinAs(qm, blindRivetBin({ diameter32: 6, initialQuantity: 100, unitCost: 0.3 }));
    const cheap = await addBinAs(qm, blindRivetBin({ grip16: 3, initialQuantity: 150 }));
    const alerts = (await ok(post(qm, '/api/alerts/refresh'))) as unknown as { data: { id: number; bin: { code: string } }[] };
    const alertOf = (code: string) => alerts.data.find((a) => a.bin.code === code)!.id;
    await ok(post(qm, `/api/alerts/${alertOf(late.code)}/ordered`, { quantity: 600, expectedAt: '2026-11-28' }));
    await ok(post(qm, `/api/alerts/${alertOf(soon.code)}/ordered`, { quantity: 600, expectedAt: '2026-12-04' }));
    await ok(post(qm, `/api/alerts/${alertOf(far.code)}/ordered`, { quantity: 200, expectedAt: '2026-12-15' }));
    // Half of the late order came: the rest is still on its way.
    await ok(post(qm, `/api/bins/${late.code}/receive`, { quantity: 300 }), 201);

    t.clock.now = TODAY;
    const before = dataSnapshot(t.db);
    const home = await today();
    expect(dataSnapshot(t.db)).toEqual(before);

    // The same function as the purchase list (read after the GET, which raised nothing).
    const purchase = purchaseListSchema.parse((await qm.agent.get('/api/alerts/purchase-list')).body).data.flatMap((g) => g.lines);
    expect(purchase.map((l) => l.bin.code).sort()).toEqual([cheap.code, waiting.code].sort());
    expect(home.toOrder).toEqual({
      bins: 2,
      totalCents: purchase.reduce((s, l) => s + l.costCents, 0),
      top: [waiting, cheap].map((b) => {
        const l = purchase.find((p) => p.bin.code === b.code)!;
        return { code: b.code, designation: l.bin.designation, unit: 'each', quantity: l.quantity, costCents: l.costCents };
      }),
    });
    expect(home.toOrder.top[0]!.costCents).toBeGreaterThan(home.toOrder.top[1]!.costCents);

    expect(home.deliveries.expected).toEqual([
      expect.objectContaining({ alertId: alertOf(soon.code), code: soon.code, quantity: 600, unit: 'each', expectedAt: '2026-12-04', words: 'expected in 3 days' }),
    ]);
    expect(home.deliveries.late).toEqual([
      expect.objectContaining({ alertId: alertOf(late.code), code: late.code, quantity: 300, expectedAt: '2026-11-28', words: '3 days late' }),
    ]);

    // Today's own and tomorrow's in words; the screws come in on the 15th, past the week.
    t.clock.now = new Date('2026-12-03T09:00:00Z');
    expect((await today()).deliveries.expected.map((d) => d.words)).toEqual(['expected tomorrow']);
    t.clock.now = new Date('2026-12-04T23:00:00Z');
    expect((await today()).deliveries.expected.map((d) => d.words)).toEqual(['expected today']);
    t.clock.now = new Date('2026-12-08T09:00:00Z');
    expect((await today()).deliveries.expected.map((d) => [d.code, d.words])).toEqual([[far.code, 'expected in 7 days']]);
  });

  test('suggests bins to count: from the 10 counted longest ago (never first), the 5 most valuable', async ({ t, qm, at, today }) => {
    at('2026-11-10');
    const bins = [];
    for (let i = 1; i <= 12; i++) {
      bins.push(await addBinAs(qm, { kind: 'washer', name: `Washer AN960-${i}`, unit: 'each', unitCost: i / 100, initialQuantity: 100, supplier: 'Harbour Hardware Co.' }));
    }
    const [w6, w7, w8, w9, w10, w11, w12] = bins.slice(5);
    at('2026-11-24');
    await ok(post(qm, `/api/bins/${w12!.code}/count`, { counted: 100 }), 201);
    at('2026-11-25');
    await ok(post(qm, `/api/bins/${w11!.code}/count`, { counted: 100 }), 201);
    at('2026-11-26');
    await ok(post(qm, `/api/bins/${w10!.code}/count`, { counted: 98, note: 'Two short' }), 201);

    t.clock.now = TODAY;
    const { binsToCount } = await today();
    expect(binsToCount.bins.map((b) => b.code)).toEqual([w12, w9, w8, w7, w6].map((b) => b!.code));
    expect(binsToCount.bins[0]).toEqual({ code: w12!.code, designation: 'Washer AN960-12', unit: 'each', onHand: 100, valueCents: 1200, lastCountedAt: '2026-11-24T12:00:00.000Z' });
    expect(binsToCount.bins[1]).toMatchObject({ code: w9!.code, valueCents: 900, lastCountedAt: null });
  });

  test('lists returns needing attention, missing accessories and service due, each from the tools’ own functions', async ({ t, qm, member, at, today }) => {
    at('2026-11-28');
    const gun = (await addToolAs(qm, { name: 'Rivet gun, 2X', category: 'rivet_gun' })).code;
    const puller = (await addToolAs(qm, { name: 'Hand rivet puller', category: 'hand_rivet_puller', accessories: ['Nosepiece 1/8', 'Nosepiece 5/32'] })).code;
    const shelved = (await addToolAs(qm, { name: 'Rivet gun, 3X', category: 'rivet_gun' })).code;
    const daysAgo = (n: number) => new Date(TODAY.getTime() - n * DAY_MS).toISOString();
    const dueSoon = (await addToolAs(qm, { name: 'Torque wrench, 1/4 drive', category: 'torque_wrench', serviceIntervalDays: 365, lastServiceAt: daysAgo(360) })).code;
    const overdue = (await addToolAs(qm, { name: 'Torque wrench, 3/8 drive', category: 'torque_wrench', serviceIntervalDays: 365, lastServiceAt: daysAgo(370) })).code;
    await addToolAs(qm, { name: 'Dial caliper, 6 in', category: 'measuring', serviceIntervalDays: 730, lastServiceAt: daysAgo(100) });

    await ok(post(member, `/api/tools/${gun}/checkout`, {}), 201);
    await ok(post(member, `/api/tools/${puller}/checkout`, { accessories: ['Nosepiece 1/8', 'Nosepiece 5/32'] }), 201);
    at('2026-11-30', 17);
    await ok(post(member, `/api/tools/${gun}/return`, { condition: 'needs_attention', note: 'Trigger sticks' }));
    await ok(post(member, `/api/tools/${puller}/return`, { condition: 'ok', accessoriesBack: ['Nosepiece 1/8'] }));
    // Taken out of service by the quartermaster, not returned so: not a return needing attention.
    await ok(post(qm, `/api/tools/${shelved}/out-of-service`, { note: 'Spring worn' }));

    t.clock.now = TODAY;
    const home = await today();
    expect(home.returnsNeedingAttention).toEqual([{ code: gun, name: 'Rivet gun, 2X', note: 'Trigger sticks', returnedBy: 'Mia Member', returnedAt: '2026-11-30T17:00:00.000Z' }]);
    expect(home.missingAccessories).toEqual([{ code: puller, name: 'Hand rivet puller', items: [{ accessory: 'Nosepiece 5/32', lastHolder: 'Mia Member' }] }]);
    expect(home.serviceDue).toEqual({
      withinDays: 14,
      total: 2,
      top: [
        { code: overdue, name: 'Torque wrench, 3/8 drive', words: 'Calibration overdue by 5 days', overdue: true },
        { code: dueSoon, name: 'Torque wrench, 1/4 drive', words: 'Calibration due in 5 days', overdue: false },
      ],
    });

    // Back in service after a look, and the nosepiece found: both leave home.
    await ok(post(qm, `/api/tools/${gun}/back-in-service`, { note: 'Cleaned and oiled' }));
    await ok(post(qm, `/api/tools/${puller}/missing-accessories/resolve`, { accessory: 'Nosepiece 5/32', resolution: 'found' }));
    const after = await today();
    expect(after.returnsNeedingAttention).toEqual([]);
    expect(after.missingAccessories).toEqual([]);
  });

  test('lists write-offs of the last 14 days that still stand, newest first, with who and when', async ({ t, qm, at, today }) => {
    at('2026-11-10');
    const sealant = await addBinAs(qm, { kind: 'sealant_primer', name: 'Fuel tank sealant, 3.5 oz', unit: 'tube', unitCost: 18, initialQuantity: 6 });
    const rivets = await addBinAs(qm, blindRivetBin());
    await ok(post(qm, `/api/bins/${sealant.code}/write-off`, { quantity: 1, note: 'Cured in the tube' }), 201);
    at('2026-11-25', 10);
    await ok(post(qm, `/api/bins/${sealant.code}/write-off`, { quantity: 2, note: 'Past its shelf-life date' }), 201);
    at('2026-11-28', 15);
    const mistaken = await ok(post(qm, `/api/bins/${rivets.code}/write-off`, { quantity: 40, note: 'Dropped on the floor' }), 201);
    await ok(post(qm, `/api/bins/${rivets.code}/ledger/${mistaken.id}/reverse`, { note: 'Swept up and sorted: all good' }), 201);
    at('2026-11-30', 9);
    await ok(post(qm, `/api/bins/${rivets.code}/write-off`, { quantity: 25, note: 'Mandrels bent' }), 201);

    t.clock.now = TODAY;
    const { writeOffs } = await today();
    expect(writeOffs.withinDays).toBe(14);
    expect(writeOffs.entries).toEqual([
      { id: expect.any(Number), code: rivets.code, designation: expect.stringMatching(/\S/), unit: 'each', quantity: 25, by: 'Quinn Quartermaster', at: '2026-11-30T09:00:00.000Z', note: 'Mandrels bent' },
      { id: expect.any(Number), code: sealant.code, designation: 'Fuel tank sealant, 3.5 oz', unit: 'tube', quantity: 2, by: 'Quinn Quartermaster', at: '2026-11-25T10:00:00.000Z', note: 'Past its shelf-life date' },
    ]);
  });
});

describe('the quartermaster’s today in the demo chapter', () => {
  test('shows the demo’s real work: its purchase list, the late and coming orders, the gun back needing attention, the calibration due, a write-off', async () => {
    const demo = await buildTestApp({ now: () => new Date() });
    try {
      expect(await seedDemoChapter(demo.db)).toBe(true);
      const ruth = await demo.signIn('quartermaster@example.org', DEMO_PASSWORD);
      const before = dataSnapshot(demo.db);
      const res = await ruth.agent.get('/api/today/quartermaster');
      expect(res.status).toBe(200);
      expect(dataSnapshot(demo.db)).toEqual(before);
      const home = quartermasterTodaySchema.parse(res.body);

      const purchase = purchaseListSchema.parse((await ruth.agent.get('/api/alerts/purchase-list')).body).data.flatMap((g) => g.lines);
      expect(purchase.length).toBeGreaterThan(0);
      expect(home.toOrder.bins).toBe(purchase.length);
      expect(home.toOrder.totalCents).toBe(purchase.reduce((s, l) => s + l.costCents, 0));

      expect(home.deliveries.late).toEqual([expect.objectContaining({ words: '1 day late' })]);
      expect(home.deliveries.expected).toEqual([expect.objectContaining({ words: 'expected in 3 days' })]);
      expect(home.returnsNeedingAttention).toEqual([expect.objectContaining({ name: 'Rivet gun, 3X', returnedBy: 'Tomasz Wren', note: 'Throttle valve leaks air' })]);
      expect(home.missingAccessories).toEqual([expect.objectContaining({ name: 'Rivet gun, 3X', items: [{ accessory: 'Flush set', lastHolder: 'Tomasz Wren' }] })]);
      expect(home.serviceDue.top).toContainEqual(expect.objectContaining({ name: 'Torque wrench, 20–150 in-lb', overdue: true }));
      expect(home.binsToCount.bins).toHaveLength(5);
      expect(home.binsToCount.bins.every((b) => b.lastCountedAt === null)).toBe(true);
      const values = home.binsToCount.bins.map((b) => b.valueCents);
      expect(values).toEqual([...values].sort((a, b) => b - a));
      expect(home.writeOffs.entries).toEqual([expect.objectContaining({ designation: 'Self-etching primer, 12 oz spray can', quantity: 1, unit: 'can', by: 'Ruth Lindqvist' })]);
    } finally {
      await demo.close();
    }
  }, 60_000);
});
