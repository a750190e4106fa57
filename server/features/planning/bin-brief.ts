import type { BinForecastDto } from '@shared/schemas/forecast';
import { binDesignation } from '@shared/stock/fasteners';
import { e4ToDollars } from '@shared/stock/money';
import type { BinRow } from '../stock/stock.reads';

export type BinBrief = BinForecastDto['bin'];

/** The few facts of a bin the forecast, the alerts and the purchase list show. */
export function binBrief(bin: BinRow): BinBrief {
  return {
    code: bin.code,
    designation: binDesignation(bin),
    kind: bin.kind,
    supplier: bin.supplier,
    supplierPart: bin.supplierPart,
    packSize: bin.packSize,
    unit: bin.unit,
    unitCost: e4ToDollars(bin.unitCostE4),
    onHand: bin.onHand,
    leadTimeDays: bin.leadTimeDays,
  };
}
