import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { reorderDecision, type ReorderInput } from '@shared/forecast/reorder';

// A bin of rivets in packs of 100: the forecast puts the reorder point at 120, the EOQ at 458.3.
const bin: ReorderInput = { onHand: 300, onOrder: 0, packSize: 100, forecastReorderPoint: 120, binReorderPoint: 0, binReorderQty: 0, eoq: 458.3, projectedShortfall: 0 };

describe('the one reorder rule', () => {
  it('orders nothing above the reorder point', () => {
    expect(reorderDecision(bin)).toMatchObject({ reorderPoint: 120, orderUpTo: 579, order: false, quantity: 0, packs: 0 });
  });

  it('orders up to s + Q in whole packs, making up what a lump draw took below s', () => {
    // s = 120, Q = ⌈458.3⌉ = 459, S = 579. At 120: 459 → 5 packs. At 20 (a draw of 100 went 100 below s): 559 → 6 packs.
    expect(reorderDecision({ ...bin, onHand: 120 })).toMatchObject({ order: true, quantity: 500, packs: 5 });
    expect(reorderDecision({ ...bin, onHand: 20 })).toMatchObject({ order: true, quantity: 600, packs: 6 });
  });

  it('keeps the point and quantity typed on the bin as floors', () => {
    // s = max(120, 200) = 200; Q = max(458.3, 800) = 800; S = 1,000; at 150: 850 → 9 packs.
    expect(reorderDecision({ ...bin, onHand: 150, binReorderPoint: 200, binReorderQty: 800 })).toMatchObject({ reorderPoint: 200, orderUpTo: 1000, order: true, quantity: 900 });
    // The forecast's point stays when it is higher than the typed one.
    expect(reorderDecision({ ...bin, binReorderPoint: 50 }).reorderPoint).toBe(120);
  });

  it('counts what is on order, so it is not ordered twice', () => {
    // On hand 100 + 400 on order = 500 > 120: nothing more. With 10 on order: position 110 → 579 − 110 = 469 → 5 packs.
    expect(reorderDecision({ ...bin, onHand: 100, onOrder: 400 })).toMatchObject({ inventoryPosition: 500, order: false, quantity: 0 });
    expect(reorderDecision({ ...bin, onHand: 100, onOrder: 10 })).toMatchObject({ inventoryPosition: 110, order: true, quantity: 500 });
  });

  it('orders at least one pack, and at least the projected shortfall, when the projection falls below safety stock', () => {
    expect(reorderDecision({ ...bin, eoq: 0, projectedShortfall: 3 })).toMatchObject({ order: true, quantity: 100 });
    expect(reorderDecision({ ...bin, onHand: 900, projectedShortfall: 750 })).toMatchObject({ order: true, quantity: 800 });
  });

  it('leaves a bin nothing draws from and with no point typed alone, even empty', () => {
    expect(reorderDecision({ ...bin, onHand: 0, forecastReorderPoint: 0, eoq: 0 })).toMatchObject({ order: false, quantity: 0 });
  });

  it('refuses a pack size that is not a whole number', () => {
    expect(() => reorderDecision({ ...bin, packSize: 2.5 })).toThrow(RangeError);
  });

  it('orders the fewest whole packs that bring the position up to S, and nothing above s', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 20_000 }),
        fc.integer({ min: 0, max: 5000 }),
        fc.integer({ min: 1, max: 500 }),
        fc.integer({ min: 0, max: 3000 }),
        fc.integer({ min: 0, max: 3000 }),
        fc.double({ min: 0, max: 5000, noNaN: true }),
        (onHand, onOrder, packSize, forecastReorderPoint, binReorderQty, eoq) => {
          const d = reorderDecision({ ...bin, onHand, onOrder, packSize, forecastReorderPoint, binReorderQty, eoq });
          expect(d.quantity % packSize).toBe(0);
          if (!d.order) {
            expect(d.quantity).toBe(0);
            expect(d.reorderPoint === 0 || d.inventoryPosition > d.reorderPoint).toBe(true);
          } else {
            expect(d.inventoryPosition).toBeLessThanOrEqual(d.reorderPoint);
            expect(d.inventoryPosition + d.quantity).toBeGreaterThanOrEqual(d.orderUpTo);
            expect(d.quantity === packSize || d.inventoryPosition + d.quantity - packSize < d.orderUpTo).toBe(true);
          }
        },
      ),
    );
  });
});
