import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { inverseNormal } from '@shared/forecast/inverse-normal';
import { eoq, reorderPoint, safetyStock } from '@shared/forecast/inventory';

describe('eoq', () => {
  it('gives Q* = 200 for D = 1,000/yr, S = $10, H = $0.50 (Heizer & Render, Operations Management, ch. 12, Example 3)', () => {
    expect(eoq({ annualDemand: 1000, orderCost: 10, holdingCostPerUnitYear: 0.5 })).toBeCloseTo(200, 10);
  });

  it('is 0 when nothing is used and refuses a holding cost of 0 or less', () => {
    expect(eoq({ annualDemand: 0, orderCost: 10, holdingCostPerUnitYear: 0.5 })).toBe(0);
    expect(() => eoq({ annualDemand: 1000, orderCost: 10, holdingCostPerUnitYear: 0 })).toThrow(RangeError);
    expect(() => eoq({ annualDemand: -1, orderCost: 10, holdingCostPerUnitYear: 1 })).toThrow(RangeError);
  });

  it('scales with the square root of demand: four times the demand, twice the order', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e7, noNaN: true }),
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        fc.double({ min: 1e-4, max: 1e3, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        (annualDemand, orderCost, holdingCostPerUnitYear, k) => {
          const base = eoq({ annualDemand, orderCost, holdingCostPerUnitYear });
          const scaled = eoq({ annualDemand: annualDemand * k * k, orderCost, holdingCostPerUnitYear });
          expect(Math.abs(scaled - base * k)).toBeLessThanOrEqual(1e-12 * Math.max(1, scaled));
        },
      ),
    );
  });

  it('never falls when ordering costs more, never rises when holding costs more', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e6, noNaN: true }),
        fc.double({ min: 0, max: 1e3, noNaN: true }),
        fc.double({ min: 0, max: 1e3, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e2, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e2, noNaN: true }),
        (annualDemand, s1, s2, h1, h2) => {
          const at = (orderCost: number, holdingCostPerUnitYear: number) => eoq({ annualDemand, orderCost, holdingCostPerUnitYear });
          expect(at(Math.min(s1, s2), h1)).toBeLessThanOrEqual(at(Math.max(s1, s2), h1));
          expect(at(s1, Math.min(h1, h2))).toBeGreaterThanOrEqual(at(s1, Math.max(h1, h2)));
        },
      ),
    );
  });
});

describe('safety stock and reorder point', () => {
  // Stevenson, Operations Management, 14th ed., ch. 12, Example 8: lead-time demand 50 t, σ_dLT = 5 t,
  // 3 % stockout risk → z = 1.88, safety stock 9.40 t, ROP 59.40 t. σ_dLT is given for the whole
  // lead time, so it is σ_d with L = 1.
  it('reproduces Stevenson Example 8 with the table z = 1.88', () => {
    const stock = safetyStock({ z: 1.88, sigmaWeekly: 5, leadTimeWeeks: 1 });
    expect(stock).toBeCloseTo(9.4, 10);
    expect(reorderPoint({ leadTimeDemand: 50, safetyStock: stock })).toBeCloseTo(59.4, 10);
  });

  it('reproduces Stevenson Example 8 within the table rounding with the exact z for 97 %', () => {
    const z = inverseNormal(0.97); // 1.8808 exact; the book's table gives 1.88
    expect(z).toBeCloseTo(1.88, 2);
    const stock = safetyStock({ z, sigmaWeekly: 5, leadTimeWeeks: 1 }); // 1.8808 × 5 = 9.404
    expect(Math.abs(stock - 9.4)).toBeLessThan(0.01);
    expect(Math.abs(reorderPoint({ leadTimeDemand: 50, safetyStock: stock }) - 59.4)).toBeLessThan(0.01);
  });

  it('grows with the square root of the lead time: 4 weeks doubles a week’s safety stock', () => {
    // 1.88 × 5 × √4 = 18.80
    expect(safetyStock({ z: 1.88, sigmaWeekly: 5, leadTimeWeeks: 4 })).toBeCloseTo(18.8, 10);
    expect(safetyStock({ z: 1.88, sigmaWeekly: 0, leadTimeWeeks: 4 })).toBe(0);
  });

  it('refuses a negative deviation or lead time', () => {
    expect(() => safetyStock({ z: 1.65, sigmaWeekly: -1, leadTimeWeeks: 2 })).toThrow(RangeError);
    expect(() => safetyStock({ z: 1.65, sigmaWeekly: 1, leadTimeWeeks: -2 })).toThrow(RangeError);
    expect(() => reorderPoint({ leadTimeDemand: -5, safetyStock: 1 })).toThrow(RangeError);
  });

  it('never lowers the reorder point when the service level rises', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 0.9999, noNaN: true }),
        fc.double({ min: 0.5, max: 0.9999, noNaN: true }),
        fc.double({ min: 0, max: 1000, noNaN: true }),
        fc.double({ min: 0, max: 26, noNaN: true }),
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        (a, b, sigmaWeekly, leadTimeWeeks, leadTimeDemand) => {
          const rop = (level: number) => reorderPoint({ leadTimeDemand, safetyStock: safetyStock({ z: inverseNormal(level), sigmaWeekly, leadTimeWeeks }) });
          expect(rop(Math.min(a, b))).toBeLessThanOrEqual(rop(Math.max(a, b)));
        },
      ),
    );
  });
});
