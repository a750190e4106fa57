import type { Bin, LedgerEntry, RestockItem } from '@shared/schemas/bins';
import { binGripRange, fastenerDesignation } from '@shared/stock/fasteners';

let nextId = 1;

/** A bin as GET /api/bins sends it; designation, grip range and low are derived the way the server derives them. */
export function binFixture(code: string, over: Partial<Bin> = {}): Bin {
  const base: Bin = {
    id: nextId++,
    code,
    kind: 'screw',
    name: '',
    designation: '',
    gripRange: null,
    head: null,
    material: null,
    stemMaterial: null,
    diameter32: null,
    grip16: null,
    gripMin: null,
    gripMax: null,
    length16: null,
    drillSize: null,
    holeDrill: null,
    unit: 'each',
    packSize: 100,
    unitCost: 0.05,
    supplier: 'Prairie Aero Supply',
    supplierPart: '',
    leadTimeDays: 14,
    reorderPoint: 100,
    reorderQty: 500,
    location: 'Cabinet R, drawer 1',
    notes: '',
    onHand: 400,
    low: false,
    toOrder: 0,
    onOrder: 0,
    reorderAt: 100,
    orderCostCents: 0,
    stockValueCents: 0,
    lastCountedAt: null,
    ...over,
  };
  const designation = fastenerDesignation(base) ?? base.name;
  const gripRange = binGripRange(base) ?? null;
  return { ...base, designation, gripRange, gripMin: gripRange?.min ?? null, gripMax: gripRange?.max ?? null, reorderAt: base.reorderPoint, low: base.onHand <= base.reorderPoint, ...over };
}

/** A Restock line: the numbers the server works out are given, so a test reads them as data. */
export function restockFixture(code: string, over: Partial<RestockItem> & Pick<RestockItem, 'toOrder' | 'packsToOrder' | 'orderCostCents'>): RestockItem {
  return { ...binFixture(code, { onHand: 20, reorderPoint: 100, ...over }), ...over };
}

/** A ledger entry on B-0107 at $0.13 each, as GET /api/bins/:code/ledger sends it, made by `actor`, at no station. */
export function ledgerEntryFixture(actor: { id: number; name: string }, over: Partial<LedgerEntry> & Pick<LedgerEntry, 'id' | 'kind' | 'quantity' | 'balanceAfter'>): LedgerEntry {
  return {
    binCode: 'B-0107',
    at: '2026-11-20T15:00:00.000Z',
    unitCost: 0.13,
    valueCents: Math.round(over.quantity * 13),
    actor,
    member: null,
    assemblyId: null,
    assembly: null,
    note: '',
    reversesId: null,
    reversedById: null,
    otherBinCode: null,
    slipId: null,
    station: null,
    masked: false,
    ...over,
  };
}
