import { eq, inArray } from 'drizzle-orm';
import { describe, expect } from 'vitest';
import { alertListSchema, purchaseListSchema, type Alert } from '@shared/schemas/forecast';
import { binAlerts } from '../../server/db/schema/builds';
import { REFRESH_AFTER_MS, refreshIfStale } from '../../server/features/planning/alerts.service';
import { addBinAs, blindRivetBin, post } from '../helpers/crib';
import { addAssembly, DAY_MS, drawFrom, hundredRivetLine, screwBin } from '../helpers/planning-fixture';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { dataSnapshot } from '../helpers/db-snapshot';
import { crewTest } from '../helpers/crew-test';
import type { SignedInAgent } from '../helpers/test-app';

/**
 * A bin of 100 rivets (lead time 14 days) and an assembly needing 105 of them this week. Forecast:
 * week 0 demand 105, projected −5; reorder point 105 (σ = 0, no safety stock). Suggested order:
 * EOQ √(2 × 210 × $15 / (25 % × $0.12)) = √210,000 = 458.3 (D = 105 / 26 × 52 = 210 a year) → 5 packs = 500.
 */
// Tuesday 2026-12-01 12:00 UTC: week 0 runs Monday 2026-11-30 to Sunday 2026-12-06.
const test = crewTest
  .extend('binRunningLow', ({ qm, member }) =>
    async (over: Record<string, unknown> = {}, line: Record<string, unknown> = hundredRivetLine) => {
      const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 100, leadTimeDays: 14, reorderPoint: 0, ...over }));
      await addAssembly(member, { name: `Rib bay for ${bin.code}`, plannedStart: '2026-12-01', plannedFinish: '2026-12-06', lines: [line] });
      return bin;
    })
  .extend('refresh', ({ qm }) => async (who: SignedInAgent = qm) => {
    const res = await post(who, '/api/alerts/refresh');
    expect(res.status).toBe(200);
    return res.body as { raised: number; data: Alert[] };
  })
  .extend('alertsIn', ({ qm }) => async (state: string) => alertListSchema.parse((await qm.agent.get(`/api/alerts?state=${state}`)).body).data)
  .extend('activeRows', ({ t }) => () => t.db.select().from(binAlerts).where(inArray(binAlerts.state, ['open', 'ordered'])).all())
  /** Two rivet bins from one supplier and a screw bin from another, all running low. */
  .extend('threeLowBins', ({ qm, member, binRunningLow, refresh }) => async () => {
    const dome = await binRunningLow();
    const fat = await binRunningLow({ diameter32: 5 }, { ...hundredRivetLine, rivet: { ...hundredRivetLine.rivet, diameter32: 5 } });
    // 250 screws this week against 200 on hand (lead time 7 days): reorder point 250;
    // EOQ √(2 × 500 × $15 / (25 % × $0.09)) = 816.5 → Q = 817; order up to 250 + 817 = 1,067:
    // 1,067 − 200 = 867 → 18 packs of 50 = 900, $81.00.
    const screws = await addBinAs(qm, screwBin({ supplierPart: '=HYPERLINK("http://x.test")' }));
    await addAssembly(member, { name: 'Tool chest', plannedStart: '2026-12-01', plannedFinish: '2026-12-06', extraItems: [{ binCode: screws.code, quantity: 250 }] });
    const { data } = await refresh();
    expect(data).toHaveLength(3);
    return { dome, fat, screws, alerts: data };
  });

describe('reorder alerts', () => {
  test('are a pure read: opening the list raises nothing, however long since the last check; the check raises them', async ({ t, qm, binRunningLow, refresh, alertsIn }) => {
    await binRunningLow();
    const before = dataSnapshot(t.db);
    for (const state of ['active', 'open', 'all']) expect((await qm.agent.get(`/api/alerts?state=${state}`)).status).toBe(200);
    t.clock.now = new Date(t.clock.now.getTime() + REFRESH_AFTER_MS + 1);
    expect(await alertsIn('open')).toEqual([]);
    expect(dataSnapshot(t.db)).toEqual(before);
    expect((await refresh()).raised).toBe(1);
    expect(await alertsIn('open')).toHaveLength(1);
  });

  test('are checked by the 5-minute job once the last check is over 5 minutes old', async ({ t, binRunningLow, activeRows }) => {
    const ctx = { db: t.db, publicUrl: 'http://localhost', now: () => t.clock.now };
    expect(refreshIfStale(ctx)).toBeDefined(); // the first check after a start always runs
    await binRunningLow();
    expect(refreshIfStale(ctx)).toBeUndefined();
    expect(activeRows()).toEqual([]);
    t.clock.now = new Date(t.clock.now.getTime() + REFRESH_AFTER_MS + 1);
    expect(refreshIfStale(ctx)).toBeDefined();
    expect(activeRows()).toHaveLength(1);
  });

  test('goes open → ordered → closed by the next receipt, the order counting as an expected receipt meanwhile', async ({ t, qm, binRunningLow, refresh, alertsIn }) => {
    const bin = await binRunningLow();
    const raised = await refresh();
    expect(raised.raised).toBe(1);
    const alert = raised.data[0]!;
    expect(alert).toMatchObject({
      state: 'open',
      bin: { code: bin.code, supplier: 'Cedar Valley Fastener Supply', onHand: 100, packSize: 100 },
      raisedAt: '2026-12-01T12:00:00.000Z',
      onHandAtRaise: 100,
      reorderPoint: 105,
      safetyStock: 0,
      suggestedQty: 500,
      orderedAt: null,
      closedAt: null,
    });
    expect(alert.reason).toBe('On hand 100 is at or below the reorder point 105; Projected to fall below safety stock (0) this week, inside the 2-week lead time');

    const ordered = await post(qm, `/api/alerts/${alert.id}/ordered`, { quantity: 500, expectedAt: '2026-12-10', note: 'phoned in' });
    expect(ordered.status).toBe(200);
    expect(ordered.body).toMatchObject({ state: 'ordered', orderedQty: 500, expectedAt: '2026-12-10', orderedAt: '2026-12-01T12:00:00.000Z', orderedBy: { name: 'Quinn Quartermaster' } });
    expect(ordered.body.reason).toContain('Order note: phoned in');

    // Thursday 2026-12-10 is in week 1: the 500 arrive there in the projection.
    const forecast = (await qm.agent.get(`/api/forecast?bins=${bin.code}`)).body.data[0];
    expect(forecast.expectedReceipts).toEqual([{ week: 1, quantity: 500 }]);
    expect(forecast.projected.slice(0, 3)).toEqual([-5, 495, 495]);

    expect((await refresh()).raised).toBe(0);

    t.clock.now = new Date('2026-12-09T15:00:00Z');
    const receipt = await post(qm, `/api/bins/${bin.code}/receive`, { quantity: 500 });
    expect(receipt.status).toBe(201);
    const closed = await alertsIn('closed');
    expect(closed).toHaveLength(1);
    expect(closed[0]).toMatchObject({ id: alert.id, state: 'closed', closedAt: '2026-12-09T15:00:00.000Z' });
    expect(t.db.select().from(binAlerts).where(eq(binAlerts.id, alert.id)).get()?.closedByMovementId).toBe(receipt.body.id);
    expect(await alertsIn('active')).toEqual([]);
    // 600 on hand now covers the reorder point: no new alert.
    expect((await refresh()).raised).toBe(0);
  });

  test('keeps the rest of a partly received order on order, and closes the alert when all of it has come', async ({ t, qm, binRunningLow, refresh, alertsIn }) => {
    const bin = await binRunningLow();
    const alert = (await refresh()).data[0]!;
    await post(qm, `/api/alerts/${alert.id}/ordered`, { quantity: 500, expectedAt: '2026-12-10' });

    const first = await post(qm, `/api/bins/${bin.code}/receive`, { quantity: 200, note: 'first box of three' });
    expect(first.status).toBe(201);
    const [partly] = await alertsIn('active');
    expect(partly).toMatchObject({ id: alert.id, state: 'ordered', orderedQty: 500, receivedQty: 200, onOrder: 300, toOrder: 0, closedAt: null });
    // The rest counts as on order everywhere, so nothing is ordered twice.
    const forecast = (await qm.agent.get(`/api/forecast?bins=${bin.code}`)).body.data[0];
    expect(forecast.expectedReceipts).toEqual([{ week: 1, quantity: 300 }]);
    expect((await qm.agent.get(`/api/bins/${bin.code}`)).body.onHand).toBe(300);
    expect((await qm.agent.get(`/api/bins/${bin.code}/reorder`)).body).toMatchObject({ onOrder: 300, toOrder: 0 });
    expect((await qm.agent.get('/api/bins/restock')).body.data).toEqual([]);
    expect((await refresh()).raised).toBe(0);

    const rest = await post(qm, `/api/bins/${bin.code}/receive`, { quantity: 300 });
    const [closed] = await alertsIn('closed');
    expect(closed).toMatchObject({ id: alert.id, state: 'closed', receivedQty: 500, onOrder: 0, closedAt: '2026-12-01T12:00:00.000Z' });
    expect(t.db.select().from(binAlerts).where(eq(binAlerts.id, alert.id)).get()).toMatchObject({ closedByMovementId: rest.body.id, closedById: null });
  });

  test('records more ordered on top of an order on its way, as the purchase list asks, and the forecast expects the whole of it', async ({ qm, binRunningLow, refresh }) => {
    const bin = await binRunningLow();
    const [alert] = (await refresh()).data;
    expect((await post(qm, `/api/alerts/${alert!.id}/ordered`, { quantity: 5, expectedAt: '2026-12-10' })).status).toBe(200);
    // 100 on hand + 5 on order is still at the reorder point 105: the rule orders up to 105 + 459 (EOQ over the
    // typed 450 is the bin's own; see the first test) = 564, less 105 → 459 → 5 packs of 100, on the same alert.
    const line = (await qm.agent.get('/api/alerts/purchase-list')).body.data[0].lines[0];
    expect(line).toMatchObject({ alertId: alert!.id, onOrder: 5, quantity: 500 });
    const more = await post(qm, `/api/alerts/${alert!.id}/ordered`, { quantity: 500, expectedAt: '2026-12-11', note: 'second call' });
    expect(more.status).toBe(200);
    expect(more.body).toMatchObject({ state: 'ordered', orderedQty: 505, onOrder: 505, toOrder: 0, expectedAt: '2026-12-11' });
    expect(more.body.reason).toContain('Order note: second call');
    expect((await qm.agent.get('/api/alerts/purchase-list')).body.data).toEqual([]);
    expect((await qm.agent.get(`/api/forecast?bins=${bin.code}`)).body.data[0].expectedReceipts).toEqual([{ week: 1, quantity: 505 }]);
    await post(qm, `/api/bins/${bin.code}/receive`, { quantity: 505 });
    // A closed order takes no more.
    const late = await post(qm, `/api/alerts/${alert!.id}/ordered`, { quantity: 10, expectedAt: '2026-12-20' });
    expect(late.status).toBe(409);
    expect(late.body.error.message).toMatch(/still to order or already ordered/);
  });

  test('lets the quartermaster close an order whose rest will not come, and only an ordered one', async ({ t, qm, member, binRunningLow, refresh }) => {
    const bin = await binRunningLow();
    const alert = (await refresh()).data[0]!;
    const notOrdered = await post(qm, `/api/alerts/${alert.id}/close`);
    expect(notOrdered.status).toBe(409);
    expect(notOrdered.body.error).toMatchObject({ code: 'ALERT_NOT_ORDERED', message: 'The alert for B-0001 is still to order: only an alert already ordered can be closed by hand.' });
    await post(qm, `/api/alerts/${alert.id}/ordered`, { quantity: 500, expectedAt: '2026-12-10' });
    await post(qm, `/api/bins/${bin.code}/receive`, { quantity: 200 });
    expect((await post(member, `/api/alerts/${alert.id}/close`)).status).toBe(403);
    expect((await post(qm, `/api/alerts/${alert.id}/close`, { reason: 'x' })).status).toBe(400);

    const closed = await post(qm, `/api/alerts/${alert.id}/close`);
    expect(closed.status).toBe(200);
    expect(closed.body).toMatchObject({ state: 'closed', orderedQty: 500, receivedQty: 200, onOrder: 0, closedAt: '2026-12-01T12:00:00.000Z' });
    expect(t.db.select().from(binAlerts).where(eq(binAlerts.id, alert.id)).get()?.closedById).toBe(closed.body.orderedBy.id);
    // Nothing stays on order: the forecast expects no receipt, and the 300 on hand still cover the plan.
    expect((await qm.agent.get(`/api/forecast?bins=${bin.code}`)).body.data[0].expectedReceipts).toEqual([]);
    expect((await post(qm, `/api/alerts/${alert.id}/close`)).status).toBe(409);
  });

  test('closes an open alert too when stock is received before anyone marked it ordered', async ({ qm, binRunningLow, refresh, alertsIn }) => {
    const bin = await binRunningLow();
    const { data } = await refresh();
    await post(qm, `/api/bins/${bin.code}/receive`, { quantity: 100 });
    expect((await alertsIn('closed')).map((a) => a.id)).toEqual([data[0]!.id]);
  });

  test('closes an open alert the reorder rule no longer asks for, so no screen shows an alert with nothing to order', async ({ qm, binRunningLow, refresh, alertsIn }) => {
    const bin = await binRunningLow();
    const [alert] = (await refresh()).data;
    expect(alert).toMatchObject({ state: 'open', toOrder: 500 });
    // A count finds a forgotten carton: 1,100 on hand covers the week's 105 and the reorder point.
    expect((await post(qm, `/api/bins/${bin.code}/count`, { counted: 1100 })).status).toBe(201);
    await refresh();
    expect(await alertsIn('active')).toEqual([]);
    const [closed] = await alertsIn('closed');
    expect(closed).toMatchObject({ id: alert!.id, state: 'closed', toOrder: 0, closedAt: '2026-12-01T12:00:00.000Z' });
    expect((await qm.agent.get('/api/alerts/purchase-list')).body.data).toEqual([]);
    expect((await qm.agent.get('/api/bins/restock')).body.data).toEqual([]);
  });

  test('dismisses an open or ordered alert with a reason, and keeps the bin quiet until stock falls or two weeks pass', async ({ t, qm, member, binRunningLow, refresh, alertsIn }) => {
    const bin = await binRunningLow();
    const { data } = await refresh();
    const dismissed = await post(qm, `/api/alerts/${data[0]!.id}/dismiss`, { reason: '  The kit ships with a bag of these.  ' });
    expect(dismissed.status).toBe(200);
    expect(dismissed.body).toMatchObject({ state: 'dismissed', dismissReason: 'The kit ships with a bag of these.', dismissedAt: '2026-12-01T12:00:00.000Z' });

    const twice = await post(qm, `/api/alerts/${data[0]!.id}/dismiss`, { reason: 'again' });
    expect(twice.status).toBe(409);
    expect(twice.body.error.code).toBe('ALERT_NOT_ACTIVE');
    const order = await post(qm, `/api/alerts/${data[0]!.id}/ordered`, { quantity: 100, expectedAt: '2026-12-10' });
    expect(order.status).toBe(409);
    expect(order.body.error).toMatchObject({ code: 'ALERT_NOT_ACTIVE', message: expect.stringContaining('dismissed') });

    expect((await refresh()).raised).toBe(0);
    await drawFrom(member, bin.code, 10);
    const after = await refresh();
    expect(after.raised).toBe(1);
    expect(after.data[0]).toMatchObject({ state: 'open', onHandAtRaise: 90 });

    // An ordered alert can be dismissed too (the order was cancelled); then 15 days on it is raised again.
    await post(qm, `/api/alerts/${after.data[0]!.id}/ordered`, { quantity: 100, expectedAt: '2026-12-10' });
    expect((await post(qm, `/api/alerts/${after.data[0]!.id}/dismiss`, { reason: 'Order cancelled' })).body.state).toBe('dismissed');
    expect((await refresh()).raised).toBe(0);
    t.clock.now = new Date(t.clock.now.getTime() + 15 * DAY_MS);
    expect((await refresh()).raised).toBe(1);
    expect(await alertsIn('dismissed')).toHaveLength(2);
  });

  test('keeps at most one active alert per bin however often and however fast it is refreshed', async ({ t, lead, qm, binRunningLow, refresh, activeRows }) => {
    await binRunningLow();
    const results = await Promise.all([refresh(), refresh(lead), refresh()]);
    expect(results.map((r) => r.raised).reduce((a, b) => a + b)).toBe(1);
    expect(activeRows()).toHaveLength(1);
    await post(qm, `/api/alerts/${activeRows()[0]!.id}/ordered`, { quantity: 500, expectedAt: '2026-12-08' });
    expect((await refresh()).raised).toBe(0);
    // The database itself refuses a second active alert for the bin.
    const row = activeRows()[0]!;
    expect(() => t.db.insert(binAlerts).values({ ...row, id: undefined, state: 'open' }).run()).toThrow(/UNIQUE/);
    expect(activeRows()).toHaveLength(1);
  });

  test('filters by state and refuses bad input in words', async ({ qm, binRunningLow, refresh, alertsIn }) => {
    await binRunningLow();
    const { data } = await refresh();
    const id = data[0]!.id;
    expect(await alertsIn('open')).toHaveLength(1);
    expect(await alertsIn('ordered')).toHaveLength(0);
    expect(await alertsIn('all')).toHaveLength(1);

    const state = await qm.agent.get('/api/alerts?state=urgent');
    expect(state.status).toBe(400);
    expect(state.body.error.message).toContain('state is open, ordered, closed, dismissed, active or all.');
    const order = await post(qm, `/api/alerts/${id}/ordered`, { quantity: 0, expectedAt: 'next week' });
    expect(order.status).toBe(400);
    expect(order.body.error.code).toBe('VALIDATION_FAILED');
    expect(order.body.error.message).toContain('Order at least 1.');
    expect(order.body.error.message).toContain('Use a date like 2027-01-15.');
    const past = await post(qm, `/api/alerts/${id}/ordered`, { quantity: 100, expectedAt: '2026-11-30' });
    expect(past.status).toBe(400);
    expect(past.body.error).toMatchObject({ code: 'VALIDATION_FAILED', issues: [{ path: 'expectedAt' }] });
    expect(past.body.error.message).toContain('in the past');
    const noReason = await post(qm, `/api/alerts/${id}/dismiss`, { reason: '   ' });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.message).toContain('Say why the alert is dismissed.');
    const badId = await post(qm, '/api/alerts/abc/dismiss', { reason: 'x' });
    expect(badId.status).toBe(400);
    expect(badId.body.error.message).toContain('The id must be a number.');
    const missing = await post(qm, '/api/alerts/999/dismiss', { reason: 'x' });
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe('ALERT_NOT_FOUND');
    expect((await alertsIn('open')).map((a) => a.id)).toEqual([id]);
  });

  test('takes “today” from the chapter’s calendar for the expected day and the purchase list’s file name', async ({ t, qm, binRunningLow, refresh }) => {
    await binRunningLow();
    const { data } = await refresh();
    // Tuesday 20:00 in Chicago is already Wednesday in UTC: the chapter's today is still Tuesday, December 1.
    writeChapterTimeZone(t.db, 'America/Chicago');
    t.clock.now = new Date('2026-12-02T02:00:00Z');
    const csv = await qm.agent.get('/api/alerts/purchase-list.csv');
    expect(csv.headers['content-disposition']).toBe('attachment; filename="gripline-purchase-list-2026-12-01.csv"');
    const today = await post(qm, `/api/alerts/${data[0]!.id}/ordered`, { quantity: 100, expectedAt: '2026-12-01' });
    expect(today.status).toBe(200);
    expect(today.body.expectedAt).toBe('2026-12-01');
  });

  test('is for quartermasters and leads', async ({ lead, member }) => {
    for (const path of ['/api/alerts', '/api/alerts/purchase-list', '/api/alerts/purchase-list.csv']) {
      const res = await member.agent.get(path);
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    expect((await post(member, '/api/alerts/refresh')).status).toBe(403);
    expect((await lead.agent.get('/api/alerts')).status).toBe(200);
  });
});

describe('the purchase list', () => {
  test('is a pure read: opening it raises no alert, and after a refresh it lists the same lines, each naming its alert', async ({ t, qm, binRunningLow, refresh, activeRows }) => {
    const dome = await binRunningLow();
    const before = dataSnapshot(t.db);
    const read = await qm.agent.get('/api/alerts/purchase-list');
    expect(read.status).toBe(200);
    expect(dataSnapshot(t.db)).toEqual(before);
    expect(activeRows()).toEqual([]);
    const unraised = purchaseListSchema.parse(read.body).data.flatMap((g) => g.lines);
    expect(unraised).toEqual([expect.objectContaining({ alertId: null, bin: expect.objectContaining({ code: dome.code }), quantity: 500, costCents: 6000 })]);
    expect((await qm.agent.get('/api/alerts/purchase-list.csv')).status).toBe(200);
    expect(dataSnapshot(t.db)).toEqual(before);

    const [alert] = (await refresh()).data;
    const raised = purchaseListSchema.parse((await qm.agent.get('/api/alerts/purchase-list')).body).data.flatMap((g) => g.lines);
    expect(raised).toEqual(unraised.map((l) => ({ ...l, alertId: alert!.id })));
  });

  test('groups open alerts by supplier with packs and cost, leaving ordered ones out', async ({ qm, threeLowBins }) => {
    const { dome, fat, screws, alerts } = await threeLowBins();
    const fatAlert = alerts.find((a) => a.bin.code === fat.code)!;
    await post(qm, `/api/alerts/${fatAlert.id}/ordered`, { quantity: 500, expectedAt: '2026-12-08' });

    const res = await qm.agent.get('/api/alerts/purchase-list');
    expect(res.status).toBe(200);
    const list = purchaseListSchema.parse(res.body);
    expect(list.data.map((g) => g.supplier)).toEqual(['Cedar Valley Fastener Supply', 'Harbour Hardware Co.']);
    expect(list.data[0]!.lines).toEqual([expect.objectContaining({ bin: expect.objectContaining({ code: dome.code }), quantity: 500, packs: 5, costCents: 6000 })]);
    expect(list.data[0]!.totalCents).toBe(6000);
    expect(list.data[1]!.lines).toEqual([expect.objectContaining({ bin: expect.objectContaining({ code: screws.code }), quantity: 900, packs: 18, costCents: 8100 })]);
    expect(list.data[1]!.totalCents).toBe(8100);
  });

  test('exports the list as CSV with formula-like text made harmless', async ({ qm, threeLowBins }) => {
    const { dome, fat, screws } = await threeLowBins();
    const res = await qm.agent.get('/api/alerts/purchase-list.csv');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe('attachment; filename="gripline-purchase-list-2026-12-01.csv"');
    const lines = res.text.replace(/^\uFEFF/, '').trim().split('\r\n');
    expect(lines[0]).toBe('supplier,supplier_part,bin_code,designation,quantity,unit,pack_size,packs,unit_cost,cost,on_order,alert_id');
    expect(lines).toHaveLength(4);
    expect(lines[1]).toMatch(new RegExp(`^Cedar Valley Fastener Supply,,${dome.code},.*,500,each,100,5,0.12,60.00,0,\\d+$`));
    expect(lines[2]).toMatch(new RegExp(`^Cedar Valley Fastener Supply,,${fat.code},`));
    expect(lines[3]).toContain(`Harbour Hardware Co.,"'=HYPERLINK(""http://x.test"")",${screws.code},`);
    expect(lines[3]).toMatch(/,900,each,50,18,0.09,81.00,0,\d+$/);
  });
});
