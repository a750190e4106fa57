import type { Bin, BinFields, BinReorder } from '@shared/schemas/bins';
import { binDesignation, binGripRange } from '@shared/stock/fasteners';
import type { BinRow } from '../../db/schema/stock';
import { e4ToDollars, valueCents } from '@shared/stock/money';

/** A bin as the API shows it, with its part of the one reorder computation (ReordersOf). */
export function toBinDto(bin: BinRow, reorder: BinReorder, lastCounted?: Date): Bin {
  return { ...toBinFields(bin, lastCounted), ...reorder };
}

/** What the bin's own row says, without the reorder computation (the scan answer and the CSV export need no more). */
export function toBinFields(bin: BinRow, lastCounted?: Date): BinFields {
  const gripRange = binGripRange(bin) ?? null;
  return {
    id: bin.id,
    code: bin.code,
    kind: bin.kind,
    name: bin.name,
    designation: binDesignation(bin),
    gripRange,
    head: bin.head,
    material: bin.material,
    stemMaterial: bin.stemMaterial,
    diameter32: bin.diameter32,
    grip16: bin.grip16,
    gripMin: gripRange?.min ?? null,
    gripMax: gripRange?.max ?? null,
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
    stockValueCents: valueCents(bin.onHand, bin.unitCostE4),
    lastCountedAt: lastCounted?.toISOString() ?? null,
  };
}
