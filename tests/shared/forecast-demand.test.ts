import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  HORIZON_WEEKS,
  WEEK_MS,
  meanAndStdDev,
  projectOnHand,
  spreadAssemblyDemand,
  weekIndexOf,
  weekStarts,
  weeklyDrawHistory,
  type PlannedAssembly,
} from '@shared/forecast/demand';

const at = (iso: string) => new Date(iso);
// Wednesday 2 December 2026, mid-afternoon UTC; its week starts Monday 30 November.
const NOW = at('2026-12-02T15:30:00Z');
const WEEKS = weekStarts(NOW);
const zeros = (n: number) => new Array<number>(n).fill(0);
const withWeeks = (values: Record<number, number>, n = HORIZON_WEEKS) => zeros(n).map((v, i) => values[i] ?? v);

describe('weekStarts', () => {
  it('starts at the UTC Monday 00:00 of the current week and runs 26 weeks', () => {
    expect(WEEKS).toHaveLength(26);
    expect(WEEKS[0]!.toISOString()).toBe('2026-11-30T00:00:00.000Z');
    expect(WEEKS[1]!.toISOString()).toBe('2026-12-07T00:00:00.000Z');
    expect(WEEKS[25]!.toISOString()).toBe('2027-05-24T00:00:00.000Z'); // 30 Nov + 175 days
  });

  it('treats Monday 00:00 as the start of its own week and Sunday night as the week before', () => {
    expect(weekStarts(at('2026-11-30T00:00:00Z'), 1)[0]!.toISOString()).toBe('2026-11-30T00:00:00.000Z');
    expect(weekStarts(at('2026-11-29T23:59:59.999Z'), 1)[0]!.toISOString()).toBe('2026-11-23T00:00:00.000Z');
  });

  it('finds the week of a date, negative before the horizon and past its end after it', () => {
    expect(weekIndexOf(at('2026-12-02T00:00:00Z'), WEEKS)).toBe(0);
    expect(weekIndexOf(at('2026-12-25T12:00:00Z'), WEEKS)).toBe(3);
    expect(weekIndexOf(at('2026-11-20T00:00:00Z'), WEEKS)).toBe(-2);
    expect(weekIndexOf(at('2027-08-01T00:00:00Z'), WEEKS)).toBe(34); // 244 days / 7 = 34.9
    expect(() => weekIndexOf(NOW, [])).toThrow(RangeError);
  });
});

describe('spreadAssemblyDemand', () => {
  const assembly = (need: [string, number][], plannedStart: string | null, plannedFinish: string | null): PlannedAssembly<string> => ({
    remainingNeed: new Map(need),
    plannedStart: plannedStart ? at(plannedStart) : null,
    plannedFinish: plannedFinish ? at(plannedFinish) : null,
  });

  it('spreads each assembly evenly over the weeks of its window from now on', () => {
    const demand = spreadAssemblyDemand(
      [
        // Rudder: 120 from B1 over weeks 1–3 (7 Dec to Fri 25 Dec) → 40 a week.
        assembly([['B1', 120]], '2026-12-07T00:00:00Z', '2026-12-25T00:00:00Z'),
        // Elevator, started 16 Nov, finishing 16 Dec (week 2): only weeks 0–2 remain → B1 30/3 = 10, B2 9/3 = 3.
        assembly([['B1', 30], ['B2', 9]], '2026-11-16T00:00:00Z', '2026-12-16T00:00:00Z'),
        // Tool chest lid with no dates: all 5 now.
        assembly([['B2', 5]], null, null),
        // Rib bay due 20 Nov, already past: all 7 now.
        assembly([['B3', 7]], '2026-11-02T00:00:00Z', '2026-11-20T00:00:00Z'),
        // Wing skin, weeks 21–34 (14 weeks) at 10 a week: weeks 21–25 fall inside the horizon.
        assembly([['B4', 140]], '2027-04-26T00:00:00Z', '2027-08-01T00:00:00Z'),
        // Flap, wholly after the horizon, and a need already met: no demand at all.
        assembly([['B5', 50]], '2027-07-01T00:00:00Z', '2027-07-30T00:00:00Z'),
        assembly([['B6', 0]], '2026-12-07T00:00:00Z', '2026-12-25T00:00:00Z'),
      ],
      WEEKS,
    );
    expect([...demand.keys()].sort()).toEqual(['B1', 'B2', 'B3', 'B4']);
    expect(demand.get('B1')).toEqual(withWeeks({ 0: 10, 1: 50, 2: 50, 3: 40 }));
    expect(demand.get('B2')).toEqual(withWeeks({ 0: 8, 1: 3, 2: 3 }));
    expect(demand.get('B3')).toEqual(withWeeks({ 0: 7 }));
    expect(demand.get('B4')).toEqual(withWeeks({ 21: 10, 22: 10, 23: 10, 24: 10, 25: 10 }));
  });

  it('puts a need with only a start date in the start’s week, and a finish before the start in the start’s week', () => {
    const demand = spreadAssemblyDemand(
      [assembly([['B1', 12]], '2026-12-15T00:00:00Z', null), assembly([['B2', 6]], '2026-12-22T00:00:00Z', '2026-12-08T00:00:00Z')],
      WEEKS,
    );
    expect(demand.get('B1')).toEqual(withWeeks({ 2: 12 }));
    expect(demand.get('B2')).toEqual(withWeeks({ 3: 6 }));
  });

  it('keeps numeric bin ids as they are', () => {
    const demand = spreadAssemblyDemand([{ remainingNeed: new Map([[42, 4]]), plannedStart: null, plannedFinish: null }], WEEKS);
    expect(demand.get(42)).toEqual(withWeeks({ 0: 4 }));
  });

  const dayOffset = fc.option(fc.integer({ min: -60, max: 260 }), { nil: null });
  const plannedAssembly = fc.record({
    need: fc.array(fc.tuple(fc.constantFrom('B1', 'B2', 'B3'), fc.integer({ min: 0, max: 500 })), { maxLength: 3 }),
    start: dayOffset,
    finish: dayOffset,
  });
  const toAssembly = ({ need, start, finish }: { need: [string, number][]; start: number | null; finish: number | null }): PlannedAssembly<string> => {
    const merged = new Map<string, number>();
    for (const [bin, n] of need) merged.set(bin, (merged.get(bin) ?? 0) + n);
    const day = (offset: number | null) => (offset === null ? null : new Date(NOW.getTime() + offset * 86_400_000));
    return { remainingNeed: merged, plannedStart: day(start), plannedFinish: day(finish) };
  };
  const horizonEnd = WEEKS[0]!.getTime() + HORIZON_WEEKS * WEEK_MS;
  const lastDay = (a: PlannedAssembly<string>) => {
    const finish = a.plannedFinish && a.plannedStart && a.plannedFinish < a.plannedStart ? a.plannedStart : (a.plannedFinish ?? a.plannedStart);
    return finish ? finish.getTime() : NOW.getTime();
  };

  it('keeps the total need of every assembly that ends inside the horizon, and never adds any', () => {
    fc.assert(
      fc.property(fc.array(plannedAssembly, { maxLength: 12 }), (raw) => {
        const assemblies = raw.map(toAssembly);
        const demand = spreadAssemblyDemand(assemblies, WEEKS);
        let spread = 0;
        for (const series of demand.values()) {
          expect(series).toHaveLength(HORIZON_WEEKS);
          for (const week of series) {
            expect(week).toBeGreaterThanOrEqual(0);
            spread += week;
          }
        }
        const total = assemblies.reduce((sum, a) => sum + [...a.remainingNeed.values()].reduce((s, n) => s + n, 0), 0);
        const allInside = assemblies.every((a) => lastDay(a) < horizonEnd);
        expect(spread).toBeLessThanOrEqual(total + 1e-9 * (1 + total));
        if (allInside) expect(spread).toBeCloseTo(total, 6);
      }),
      { numRuns: 500 },
    );
  });

  it('spreads each bin’s need in equal shares over consecutive weeks', () => {
    fc.assert(
      fc.property(plannedAssembly, (raw) => {
        const demand = spreadAssemblyDemand([toAssembly(raw)], WEEKS);
        for (const series of demand.values()) {
          const used = series.map((v, i) => [v, i] as const).filter(([v]) => v > 0);
          const shares = new Set(used.map(([v]) => v));
          expect(shares.size).toBeLessThanOrEqual(1);
          if (used.length > 0) expect(used.at(-1)![1] - used[0]![1] + 1).toBe(used.length);
        }
      }),
    );
  });
});

describe('weeklyDrawHistory', () => {
  it('sums each of the last full weeks before this one, nets returns and never goes below 0', () => {
    // 4 weeks back from the week of 30 Nov: 2–8 Nov, 9–15 Nov, 16–22 Nov, 23–29 Nov.
    const history = weeklyDrawHistory(
      [
        { binId: 'B1', at: at('2026-11-03T10:00:00Z'), quantity: 10 }, // week 0
        { binId: 'B1', at: at('2026-11-24T10:00:00Z'), quantity: 5 }, // week 3
        { binId: 'B1', at: at('2026-11-25T10:00:00Z'), quantity: -2 }, // a return in week 3 → 3
        { binId: 'B1', at: at('2026-11-29T23:59:59.999Z'), quantity: 1 }, // last instant of week 3 → 4
        { binId: 'B1', at: at('2026-11-30T00:00:00Z'), quantity: 12 }, // this week: not history yet
        { binId: 'B1', at: at('2026-11-01T23:00:00Z'), quantity: 99 }, // before the window
        { binId: 'B2', at: at('2026-11-10T09:00:00Z'), quantity: -4 }, // a return alone → 0, not −4
      ],
      NOW,
      4,
    );
    expect(history.get('B1')).toEqual([10, 0, 0, 4]);
    expect(history.get('B2')).toEqual([0, 0, 0, 0]);
    expect(history.has('B3')).toBe(false);
  });

  it('gives 26 weeks by default', () => {
    const history = weeklyDrawHistory([{ binId: 7, at: at('2026-06-01T12:00:00Z'), quantity: 3 }], NOW);
    // 1 Jun 2026 is a Monday 26 weeks before 30 Nov: the oldest week.
    expect(history.get(7)).toEqual(withWeeks({ 0: 3 }));
  });
});

describe('meanAndStdDev', () => {
  it('uses the sample standard deviation', () => {
    // mean 40/8 = 5; squared deviations 9+1+1+1+0+0+4+16 = 32; 32/7 = 4.571 → 2.1381
    const { mean, stdDev } = meanAndStdDev([2, 4, 4, 4, 5, 5, 7, 9]);
    expect(mean).toBe(5);
    expect(stdDev).toBeCloseTo(Math.sqrt(32 / 7), 12);
    expect(stdDev).toBeCloseTo(2.1381, 4);
  });

  it('is 0 for fewer than two points, and for a constant series', () => {
    expect(meanAndStdDev([])).toEqual({ mean: 0, stdDev: 0 });
    expect(meanAndStdDev([5])).toEqual({ mean: 5, stdDev: 0 });
    expect(meanAndStdDev([3, 3, 3]).stdDev).toBe(0);
  });
});

describe('projectOnHand', () => {
  it('subtracts demand week by week and adds receipts in the week they are due', () => {
    // 100 − 10 = 90; − 20 = 70; + 50 − 30 = 90; − 40 = 50
    expect(projectOnHand({ onHand: 100, weeklyDemand: [10, 20, 30, 40], expectedReceipts: [{ week: 2, quantity: 50 }] })).toEqual([90, 70, 90, 50]);
  });

  it('counts an overdue order in week 0, leaves out one due after the horizon, and goes negative', () => {
    const projected = projectOnHand({
      onHand: 10,
      weeklyDemand: [20, 20],
      expectedReceipts: [
        { week: -1, quantity: 5 },
        { week: 2, quantity: 500 },
      ],
    });
    expect(projected).toEqual([-5, -25]); // 10 + 5 − 20; − 20
  });

  it('never rises without receipts and ends at on hand minus the total demand', () => {
    fc.assert(
      fc.property(fc.integer({ min: -50, max: 10_000 }), fc.array(fc.double({ min: 0, max: 500, noNaN: true }), { maxLength: 26 }), (onHand, weeklyDemand) => {
        const projected = projectOnHand({ onHand, weeklyDemand });
        expect(projected).toHaveLength(weeklyDemand.length);
        for (let w = 1; w < projected.length; w++) expect(projected[w]).toBeLessThanOrEqual(projected[w - 1]!);
        const total = weeklyDemand.reduce((s, d) => s + d, 0);
        if (projected.length > 0) expect(projected.at(-1)).toBeCloseTo(onHand - total, 6);
      }),
    );
  });
});
