import type { Alert, BinForecastDto } from '@shared/schemas/forecast';

type BinBrief = BinForecastDto['bin'];

export function binBrief(code: string, over: Partial<BinBrief> = {}): BinBrief {
  return {
    code,
    designation: 'Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)',
    kind: 'blind_structural',
    supplier: 'Prairie Aero Supply',
    supplierPart: 'PAS-B42',
    packSize: 250,
    unit: 'each',
    unitCost: 0.08,
    onHand: 140,
    leadTimeDays: 21,
    ...over,
  };
}

/** 26 Mondays from 2027-01-04, as the server lists them. */
export const WEEKS = Array.from({ length: 26 }, (_, i) => new Date(Date.UTC(2027, 0, 4 + 7 * i)).toISOString().slice(0, 10));

/** On hand at the end of each week: on hand − cumulative demand + receipts so far. */
export function project(onHand: number, weekly: number[], receipts: { week: number; quantity: number }[]): number[] {
  let level = onHand;
  return weekly.map((d, i) => (level += receipts.filter((r) => r.week === i).reduce((s, r) => s + r.quantity, 0) - d));
}

const Z_95 = 1.6449; // exact inverse normal at 95 % (trade-checks.md §6)

/**
 * B-0001: 40 a week planned, 140 on hand, 3-week lead time, σ 12 a week, 500 on order for week 6.
 * Lead-time demand 3 × 40 = 120; safety stock ⌈1.6449 × 12 × √3⌉ = ⌈34.19⌉ = 35; reorder point 155.
 * EOQ √(2 × 2080 × $15 / (0.25 × $0.08)) = √3,120,000 ≈ 1,766.3 → 8 packs of 250 = 2,000.
 */
export function needsOrderForecast(): BinForecastDto {
  const weeklyDemand = new Array<number>(26).fill(40);
  const expectedReceipts = [{ week: 5, quantity: 500 }];
  return {
    bin: binBrief('B-0001'),
    weeks: WEEKS,
    weeklyDemand,
    demandSource: 'planned',
    projected: project(140, weeklyDemand, expectedReceipts),
    expectedReceipts,
    sigmaWeekly: 12,
    z: Z_95,
    leadTimeWeeks: 3,
    leadTimeDemand: 120,
    safetyStock: 35,
    reorderPoint: 155,
    eoq: 1766.3,
    suggestedOrder: 2000,
    needsAlert: true,
    reason: 'On hand 140 is at or below the reorder point 155; Projected to fall below safety stock (35) in week 3, inside the 3-week lead time',
  };
}

/**
 * B-0002: screws with no plan, 10 a week from history (σ 4), 800 on hand, 2-week lead time.
 * Safety stock ⌈1.6449 × 4 × √2⌉ = ⌈9.31⌉ = 10; reorder point 20 + 10 = 30.
 * EOQ √(2 × 520 × $15 / (0.25 × $0.30)) = √208,000 ≈ 456.1 → 5 packs of 100 = 500.
 */
export function stockedForecast(): BinForecastDto {
  const weeklyDemand = new Array<number>(26).fill(10);
  return {
    bin: binBrief('B-0002', { designation: 'Screw #8-32 × 1/2 pan head', kind: 'screw', supplier: 'Cedar Hollow Aircraft Parts', supplierPart: 'CH-832-8', packSize: 100, unitCost: 0.3, onHand: 800, leadTimeDays: 14 }),
    weeks: WEEKS,
    weeklyDemand,
    demandSource: 'history',
    projected: project(800, weeklyDemand, []),
    expectedReceipts: [],
    sigmaWeekly: 4,
    z: Z_95,
    leadTimeWeeks: 2,
    leadTimeDemand: 20,
    safetyStock: 10,
    reorderPoint: 30,
    eoq: 456.1,
    suggestedOrder: 500,
    needsAlert: false,
    reason: 'On hand 800 is above the reorder point 30 and stays at or above safety stock (10) through the 2-week lead time',
  };
}

export function alertFixture(id: number, over: Partial<Alert> = {}): Alert {
  return {
    id,
    state: 'open',
    bin: binBrief('B-0001'),
    raisedAt: '2027-01-04T07:00:00.000Z',
    reason: 'On hand 140 is at or below the reorder point 155',
    onHandAtRaise: 140,
    reorderPoint: 155,
    safetyStock: 35,
    suggestedQty: 2000,
    toOrder: 2000,
    orderedAt: null,
    orderedBy: null,
    orderedQty: null,
    receivedQty: 0,
    onOrder: 0,
    expectedAt: null,
    closedAt: null,
    dismissedAt: null,
    dismissReason: null,
    ...over,
  };
}
