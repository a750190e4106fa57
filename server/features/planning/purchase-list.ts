import type { PurchaseList } from '@shared/schemas/forecast';
import type { ServiceContext } from '../../context';
import { centsCell, textCell, toCsv, type CsvCell } from '../../lib/csv';
import { activeAlertBinIds } from './alerts.repo';
import { binBrief } from './bin-brief';
import { reorderPlan, type ReorderPlan } from './reorder-plan';

/** SQLite's own order for text (binary), so this list runs in the Restock list's order. */
const byText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/**
 * What the one reorder rule orders now (the Restock list's bins and quantities), by supplier (by
 * name, bins by code). A pure read: each line names the bin's active alert, or null until the next
 * refresh raises one (raising is the refresh's job, never a read's); a line whose alert is already
 * ordered asks for more on top of what is on order.
 */
export function purchaseList(ctx: ServiceContext, plan: ReorderPlan = reorderPlan(ctx)): PurchaseList {
  const alertOf = activeAlertBinIds(ctx.db);
  const orders = [...plan.orders.values()]
    .filter((o) => o.toOrder > 0)
    .sort((a, b) => byText(a.plan.bin.supplier, b.plan.bin.supplier) || byText(a.plan.bin.code, b.plan.bin.code));
  const groups = new Map<string, PurchaseList['data'][number]>();
  for (const o of orders) {
    const { bin } = o.plan;
    const group = groups.get(bin.supplier) ?? { supplier: bin.supplier, lines: [], totalCents: 0 };
    group.lines.push({ alertId: alertOf.get(bin.id) ?? null, bin: binBrief(bin), quantity: o.toOrder, packs: o.packs, costCents: o.orderCostCents, onOrder: o.onOrder });
    group.totalCents += o.orderCostCents;
    groups.set(bin.supplier, group);
  }
  return { data: [...groups.values()] };
}

const FIELDS = ['supplier', 'supplier_part', 'bin_code', 'designation', 'quantity', 'unit', 'pack_size', 'packs', 'unit_cost', 'cost', 'on_order', 'alert_id'];

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
      l.onOrder,
      l.alertId,
    ]),
  );
  return toCsv(FIELDS, rows);
}
