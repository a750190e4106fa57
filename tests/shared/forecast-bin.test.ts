import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { binForecast, demandOverWeeks, type BinForecastInput } from '@shared/forecast/bin-forecast';

const weeks = (values: Record<number, number>, n = 26) => Array.from({ length: n }, (_, i) => values[i] ?? 0);

// A bin of 1/8 in blind rivets with six weeks of draws and no assembly planning it.
const historyBin: BinForecastInput = {
  onHand: 25,
  leadTimeDays: 14,
  packSize: 100,
  unitCost: 0.05,
  weeklyPlanned: null,
  history: [10, 14, 8, 12, 6, 10],
  orderCost: 5,
  holdingRate: 0.25,
};

describe('binForecast from draw history', () => {
  // mean 60/6 = 10; squared deviations 0+16+4+4+16+0 = 40, /5 = 8 → σ = 2.8284
  // L = 2 weeks; z(95 %) = 1.6449; safety stock 1.6449 × 2.8284 × √2 = 1.6449 × 4 = 6.5794 → 7
  // lead-time demand 2 × 10 = 20; reorder point 26.5794 → 27
  // D = 10 × 52 = 520 a year; H = 0.25 × $0.05 = $0.0125; EOQ = √(2 × 520 × 5 / 0.0125) = √416000 = 644.98
  const forecast = binForecast(historyBin);

  it('uses the history mean every week and projects on hand down from it', () => {
    expect(forecast.demandSource).toBe('history');
    expect(forecast.weeklyDemand).toEqual(new Array(26).fill(10));
    expect(forecast.projected.slice(0, 4)).toEqual([15, 5, -5, -15]);
  });

  it('computes safety stock, reorder point and EOQ as worked by hand', () => {
    expect(forecast.meanWeekly).toBe(10);
    expect(forecast.sigmaWeekly).toBeCloseTo(2.8284, 4);
    expect(forecast.z).toBeCloseTo(1.6449, 4);
    expect(forecast.leadTimeWeeks).toBe(2);
    expect(forecast.leadTimeDemand).toBe(20);
    expect(forecast.safetyStockExact).toBeCloseTo(6.5794, 4);
    expect(forecast.safetyStock).toBe(7);
    expect(forecast.reorderPointExact).toBeCloseTo(26.5794, 4);
    expect(forecast.reorderPoint).toBe(27);
    expect(forecast.annualDemand).toBe(520);
    expect(forecast.eoq).toBeCloseTo(644.98, 2);
  });

  it('raises the alert for both reasons and orders the EOQ in whole packs', () => {
    // shortfall: 27 − 25 = 2 below the reorder point; week 1 ends at 5, 7 − 5 = 2 below safety stock
    expect(forecast.needsAlert).toBe(true);
    expect(forecast.weekBelowSafetyStock).toBe(1);
    expect(forecast.shortfall).toBe(2);
    expect(forecast.suggestedOrder).toBe(700); // 644.98 → 7 packs of 100
    expect(forecast.reason).toBe(
      'On hand 25 is at or below the reorder point 27; Projected to fall below safety stock (7) in week 2, inside the 2-week lead time',
    );
  });

  it('counts an open order arriving this week in the projection, and in the inventory position: nothing more to order', () => {
    const ordered = binForecast({ ...historyBin, expectedReceipts: [{ week: 0, quantity: 100 }] });
    expect(ordered.projected.slice(0, 2)).toEqual([115, 105]);
    expect(ordered.weekBelowSafetyStock).toBeNull();
    expect(ordered.onOrder).toBe(100);
    expect(ordered.needsAlert).toBe(false);
    expect(ordered.suggestedOrder).toBe(0);
    expect(ordered.reason).toBe('On hand 25 and 100 on order are above the reorder point 27; on hand stays at or above safety stock (7) through the 2-week lead time');
  });

  it('does not order again for a fall that an order already on its way, arriving later, covers', () => {
    // The 100 arrive in week 2, after on hand falls below safety stock in week 1: a new order would come later still.
    const late = binForecast({ ...historyBin, expectedReceipts: [{ week: 2, quantity: 100 }] });
    expect(late.weekBelowSafetyStock).toBe(1);
    expect(late).toMatchObject({ onOrder: 100, needsAlert: false, suggestedOrder: 0 });
  });

  it('stays quiet when on hand covers the reorder point and the lead time', () => {
    const stocked = binForecast({ ...historyBin, onHand: 300 });
    expect(stocked.needsAlert).toBe(false);
    expect(stocked.shortfall).toBe(0);
    expect(stocked.suggestedOrder).toBe(0); // nothing to order now
    expect(stocked.reason).toBe('On hand 300 is above the reorder point 27 and stays at or above safety stock (7) through the 2-week lead time');
  });
});

describe('binForecast against the textbook', () => {
  it('reproduces Stevenson Example 8 through the weekly history (within the rounding of z)', () => {
    // Stevenson, Operations Management, 14th ed., ch. 12, Example 8: lead-time demand 50, σ_dLT = 5,
    // 3 % stockout → z = 1.88, safety stock 9.40, ROP 59.40. History 45, 50, 55: mean 50, sample σ = 5.
    const forecast = binForecast({ ...historyBin, history: [45, 50, 55], leadTimeDays: 7, serviceLevel: 0.97, onHand: 100 });
    expect(forecast.z).toBeCloseTo(1.88, 2);
    expect(forecast.leadTimeDemand).toBe(50);
    expect(Math.abs(forecast.safetyStockExact - 9.4)).toBeLessThan(0.01);
    expect(Math.abs(forecast.reorderPointExact - 59.4)).toBeLessThan(0.01);
    expect(forecast.safetyStock).toBe(10);
    expect(forecast.reorderPoint).toBe(60);
  });
});

describe('binForecast from planned assemblies', () => {
  // Planned: 70 in week 1 only. Lead time 10 days = 1.4286 weeks.
  // lead-time demand = 0 × 1 + 70 × 0.4286 = 30; no variation in history → safety stock 0; ROP 30.
  // On hand 50 > 30, but week 1 (inside the lead time) ends at 50 − 70 = −20 < 0: alert, shortfall 20.
  // D = 70 / 26 × 52 = 140; H = 0.2 × $0.10 = $0.02; EOQ = √(2 × 140 × 4 / 0.02) = √56000 = 236.64 → 5 packs of 50
  const forecast = binForecast({
    onHand: 50,
    leadTimeDays: 10,
    packSize: 50,
    unitCost: 0.1,
    weeklyPlanned: weeks({ 1: 70 }),
    history: [5, 5, 5, 5],
    orderCost: 4,
    holdingRate: 0.2,
  });

  it('uses the plan, not the history', () => {
    expect(forecast.demandSource).toBe('planned');
    expect(forecast.weeklyDemand).toEqual(weeks({ 1: 70 }));
    expect(forecast.projected.slice(0, 3)).toEqual([50, -20, -20]);
  });

  it('alerts on the projection alone when the lead time reaches into a heavy week', () => {
    expect(forecast.leadTimeDemand).toBeCloseTo(30, 10);
    expect(forecast.safetyStock).toBe(0);
    expect(forecast.reorderPoint).toBe(30);
    expect(forecast.needsAlert).toBe(true);
    expect(forecast.shortfall).toBe(20);
    expect(forecast.annualDemand).toBeCloseTo(140, 10);
    expect(forecast.eoq).toBeCloseTo(236.64, 2);
    expect(forecast.suggestedOrder).toBe(250);
    expect(forecast.reason).toBe('Projected to fall below safety stock (0) in week 2, inside the 10-day lead time');
  });

  it('says "this week" when the fall comes in the current week', () => {
    const soon = binForecast({ ...historyBin, weeklyPlanned: weeks({ 0: 30 }), onHand: 20 });
    expect(soon.weekBelowSafetyStock).toBe(0);
    expect(soon.reason).toContain('Projected to fall below safety stock (7) this week, inside the 2-week lead time');
  });
});

describe('binForecast edge cases', () => {
  it('leaves an unused, empty bin alone: no demand, no alert, nothing to order', () => {
    const idle = binForecast({ ...historyBin, onHand: 0, history: [] });
    expect(idle.reorderPoint).toBe(0);
    expect(idle.needsAlert).toBe(false);
    expect(idle.suggestedOrder).toBe(0);
  });

  it('orders just the shortfall when the bin has no unit cost to weigh holding against', () => {
    const unpriced = binForecast({ ...historyBin, unitCost: 0 });
    expect(unpriced.eoq).toBe(0);
    expect(unpriced.suggestedOrder).toBe(100); // shortfall 2 → one pack
  });

  it('extends a lead time longer than the horizon at the horizon’s mean demand', () => {
    expect(demandOverWeeks([10, 20], 3)).toBe(45); // 10 + 20 + 15
    expect(demandOverWeeks([10, 20], 1.5)).toBe(20); // 10 + 20 × 0.5
    expect(demandOverWeeks([10, 20], 0)).toBe(0);
  });

  it.each([0.4, 1, Number.NaN])('refuses a service level of %s', (serviceLevel) => {
    expect(() => binForecast({ ...historyBin, serviceLevel })).toThrow(RangeError);
  });

  it('refuses a negative lead time or a fractional pack size', () => {
    expect(() => binForecast({ ...historyBin, leadTimeDays: -1 })).toThrow(RangeError);
    expect(() => binForecast({ ...historyBin, packSize: 2.5 })).toThrow(RangeError);
  });
});

describe('binForecast properties', () => {
  const input = fc.record({
    onHand: fc.integer({ min: 0, max: 5000 }),
    leadTimeDays: fc.integer({ min: 0, max: 120 }),
    packSize: fc.integer({ min: 1, max: 1000 }),
    // Settings as people give them: a unit cost to the hundredth of a cent, a holding rate of whole per cent.
    unitCost: fc.oneof(fc.constant(0), fc.integer({ min: 1, max: 50_000 }).map((e4) => e4 / 10_000)),
    weeklyPlanned: fc.option(fc.array(fc.double({ min: 0, max: 400, noNaN: true }), { minLength: 26, maxLength: 26 }), { nil: null }),
    history: fc.array(fc.integer({ min: 0, max: 400 }), { maxLength: 26 }),
    orderCost: fc.integer({ min: 0, max: 5000 }).map((cents) => cents / 100),
    holdingRate: fc.integer({ min: 0, max: 50 }).map((percent) => percent / 100),
  });

  it('never lowers the reorder point or safety stock when the service level rises', () => {
    fc.assert(
      fc.property(input, fc.double({ min: 0.5, max: 0.9999, noNaN: true }), fc.double({ min: 0.5, max: 0.9999, noNaN: true }), (bin, a, b) => {
        const low = binForecast({ ...bin, serviceLevel: Math.min(a, b) });
        const high = binForecast({ ...bin, serviceLevel: Math.max(a, b) });
        expect(low.reorderPoint).toBeLessThanOrEqual(high.reorderPoint);
        expect(low.safetyStock).toBeLessThanOrEqual(high.safetyStock);
      }),
    );
  });

  it('orders whole packs covering the shortfall, and alerts whenever on hand is at a positive reorder point', () => {
    fc.assert(
      fc.property(input, (bin) => {
        const forecast = binForecast(bin);
        expect(forecast.suggestedOrder % bin.packSize).toBe(0);
        expect(forecast.suggestedOrder).toBeGreaterThanOrEqual(forecast.shortfall - 1e-9 * bin.packSize);
        expect(forecast.shortfall).toBeGreaterThanOrEqual(0);
        if (forecast.reorderPoint > 0 && bin.onHand <= forecast.reorderPoint) expect(forecast.needsAlert).toBe(true);
        if (!forecast.needsAlert) expect(forecast.shortfall).toBe(0);
        expect(forecast.reorderPoint).toBeGreaterThanOrEqual(forecast.safetyStock);
      }),
    );
  });

  it('projects on hand that never rises without open orders', () => {
    fc.assert(
      fc.property(input, (bin) => {
        const { projected } = binForecast(bin);
        expect(projected).toHaveLength(26);
        for (let w = 1; w < projected.length; w++) expect(projected[w]).toBeLessThanOrEqual(projected[w - 1]!);
      }),
    );
  });
});
