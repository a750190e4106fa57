import type { PurchaseList } from '@shared/schemas/forecast';
import { valueCents } from '@shared/stock/money';
import type { ServiceContext } from '../../context';
import { centsCell, textCell, toCsv, type CsvCell } from '../../lib/csv';
import { openAlertsBySupplier } from './alerts.repo';
import { binBrief } from './bin-brief';

/** Open alerts grouped by supplier (by name, bins by code); each line orders the suggested quantity in whole packs. */
export function purchaseList(ctx: ServiceContext): PurchaseList {
  const groups = new Map<string, PurchaseList['data'][number]>();
  for (const { alert, bin } of openAlertsBySupplier(ctx.db)) {
    const group = groups.get(bin.supplier) ?? { supplier: bin.supplier, lines: [], totalCents: 0 };
    const quantity = alert.suggestedQty;
    const costCents = valueCents(quantity, bin.unitCostE4);
    group.lines.push({ alertId: alert.id, bin: binBrief(bin), quantity, packs: Math.ceil(quantity / bin.packSize), costCents });
    group.totalCents += costCents;
    groups.set(bin.supplier, group);
  }
  return { data: [...groups.values()] };
}

const FIELDS = ['supplier', 'supplier_part', 'bin_code', 'designation', 'quantity', 'unit', 'pack_size', 'packs', 'unit_cost', 'cost', 'alert_id'];

/** The same list as a spreadsheet, one row per bin; text cells guarded against formulas. */
export function purchaseListCsv(ctx: ServiceContext): string {
  const rows = purchaseList(ctx).data.flatMap((group) =>
    group.lines.map((l): CsvCell[] => [
      textCell(group.supplier),
      textCell(l.bin.supplierPart),
      l.bin.code,
      textCell(l.bin.designation),
      l.quantity,
      textCell(l.bin.unit),
      l.bin.packSize,
      l.packs,
      l.bin.unitCost,
      centsCell(l.costCents),
      l.alertId,
    ]),
  );
  return toCsv(FIELDS, rows);
}
