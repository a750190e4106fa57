import type { Bin } from '@shared/schemas/bins';
import { binDesignation, blindGripRange } from '@shared/stock/fasteners';
import { isBlindKind } from '@shared/stock/kinds';
import type { BinRow } from '../../db/schema/stock';
import { e4ToDollars, valueCents } from '@shared/stock/money';

/** The reorder quantity rounded up to whole packs; a bin with no reorder quantity set orders one pack. */
export function orderQuantity(bin: Pick<BinRow, 'reorderQty' | 'packSize'>): number {
  return Math.max(1, Math.ceil(bin.reorderQty / bin.packSize)) * bin.packSize;
}

export function isLow(bin: Pick<BinRow, 'onHand' | 'reorderPoint'>): boolean {
  return bin.onHand <= bin.reorderPoint;
}

export function toBinDto(bin: BinRow, lastCounted?: Date): Bin {
  const low = isLow(bin);
  return {
    id: bin.id,
    code: bin.code,
    kind: bin.kind,
    name: bin.name,
    designation: binDesignation(bin),
    gripRange: isBlindKind(bin.kind) && bin.grip16 !== null ? (blindGripRange(bin.grip16) ?? null) : null,
    head: bin.head,
    material: bin.material,
    stemMaterial: bin.stemMaterial,
    diameter32: bin.diameter32,
    grip16: bin.grip16,
    length16: bin.length16,
    drillSize: bin.drillSize,
    holeDrill: bin.holeDrill,
    unit: bin.unit,
    packSize: bin.packSize,
    unitCost: e4ToDollars(bin.unitCostE4),
    supplier: bin.supplier,
    supplierPart: bin.supplierPart,
    leadTimeDays: bin.leadTimeDays,
    reorderPoint: bin.reorderPoint,
    reorderQty: bin.reorderQty,
    location: bin.location,
    notes: bin.notes,
    onHand: bin.onHand,
    low,
    toOrder: low ? orderQuantity(bin) : 0,
    stockValueCents: valueCents(bin.onHand, bin.unitCostE4),
    lastCountedAt: lastCounted?.toISOString() ?? null,
  };
}
