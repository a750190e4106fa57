import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { erfc, inverseNormal, normalCdf } from '@shared/forecast/inverse-normal';

describe('inverseNormal', () => {
  it.each([
    // Exact values as given beside the textbook tables: Heizer & Render, Operations Management; Stevenson, Operations Management 14th ed.
    [0.95, 1.6449, 1.65],
    [0.9, 1.2816, 1.28],
    [0.97, 1.8808, 1.88],
  ])('turns a %s service level into z = %s (textbook tables round it to %s)', (p, exact, table) => {
    const z = inverseNormal(p);
    expect(z).toBeCloseTo(exact, 4);
    expect(Math.abs(z - table)).toBeLessThanOrEqual(0.006); // tables step by 0.01 and books round 1.6449 up to be safe
  });

  it('gives the two-sided 95 % and 98 % points to full precision (memory: 1.959963984540054, 2.326347874040841)', () => {
    expect(inverseNormal(0.975)).toBeCloseTo(1.959963984540054, 13);
    expect(inverseNormal(0.99)).toBeCloseTo(2.326347874040841, 13);
  });

  it('puts the median at exactly 0', () => {
    expect(inverseNormal(0.5)).toBe(0);
  });

  it('reaches far into both tails without overflowing', () => {
    expect(inverseNormal(1e-300)).toBeCloseTo(-37.047096, 5);
    expect(inverseNormal(1 - 1e-16)).toBeGreaterThan(8);
  });

  it.each([0, 1, -0.1, 1.5, Number.NaN, Number.POSITIVE_INFINITY])('throws a RangeError for p = %s', (p) => {
    expect(() => inverseNormal(p)).toThrow(RangeError);
  });

  it('is antisymmetric about the median: inverseNormal(1 − p) = −inverseNormal(p)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-300, max: 1, noNaN: true, maxExcluded: true }), (p) => {
        // q + back = 1 exactly (Sterbenz), so both sides ask for the same quantile.
        const q = 1 - p;
        const back = 1 - q;
        if (!(q > 0 && back > 0)) return;
        const left = inverseNormal(q);
        const right = -inverseNormal(back);
        expect(Math.abs(left - right)).toBeLessThanOrEqual(1e-14 * Math.max(1, Math.abs(left)));
      }),
      { numRuns: 2000 },
    );
  });

  it('round-trips through the CDF: normalCdf(inverseNormal(p)) ≈ p', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-300, max: 1, noNaN: true, maxExcluded: true }), (p) => {
        const error = Math.abs(normalCdf(inverseNormal(p)) - p);
        expect(error).toBeLessThanOrEqual(1e-12 * Math.min(p, 1 - p) + 4e-16);
      }),
      { numRuns: 3000 },
    );
  });

  it('never decreases', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-12, max: 1 - 1e-12, noNaN: true }), fc.double({ min: 1e-12, max: 1 - 1e-12, noNaN: true }), (a, b) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        expect(inverseNormal(lo)).toBeLessThanOrEqual(inverseNormal(hi));
      }),
    );
  });
});

describe('normalCdf', () => {
  it('matches the standard normal table (memory: Φ(1.96) = 0.9750021048517795, Φ(−1) = 0.15865525393145707)', () => {
    expect(normalCdf(0)).toBe(0.5);
    expect(normalCdf(1.96)).toBeCloseTo(0.9750021048517795, 15);
    expect(normalCdf(-1)).toBeCloseTo(0.15865525393145707, 15);
    // Far tail, relative accuracy (memory: Φ(−10) = 7.619853024160527e-24).
    expect(Math.abs(normalCdf(-10) / 7.619853024160527e-24 - 1)).toBeLessThan(1e-13);
  });

  it('goes to 0 and 1 at the ends', () => {
    expect(normalCdf(-40)).toBe(0);
    expect(normalCdf(40)).toBe(1);
  });

  it('is symmetric: Φ(x) + Φ(−x) = 1', () => {
    fc.assert(
      fc.property(fc.double({ min: -30, max: 30, noNaN: true }), (x) => {
        expect(normalCdf(x) + normalCdf(-x)).toBeCloseTo(1, 15);
      }),
    );
  });

  it('keeps erfc(x) + erfc(−x) = 2 and erfc(0) = 1 across all three of its intervals', () => {
    expect(erfc(0)).toBe(1);
    for (const x of [0.1, 0.46875, 0.5, 2, 4, 4.5, 10, 27]) expect(erfc(x) + erfc(-x)).toBeCloseTo(2, 15);
    // memory: erfc(1) = 0.157299207050285, erfc(4.5) = 1.966160441542887e-10
    expect(erfc(1)).toBeCloseTo(0.157299207050285, 15);
    expect(Math.abs(erfc(4.5) / 1.966160441542887e-10 - 1)).toBeLessThan(1e-14);
  });
});
