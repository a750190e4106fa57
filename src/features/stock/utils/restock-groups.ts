import type { RestockItem } from '@shared/schemas/bins';

export interface SupplierOrder {
  /** '' when the bin has no supplier set. */
  supplier: string;
  items: RestockItem[];
  totalCents: number;
}

/** Low bins as one order per supplier, suppliers by name, bins without one last. */
export function ordersBySupplier(items: readonly RestockItem[]): SupplierOrder[] {
  const groups = new Map<string, RestockItem[]>();
  for (const item of items) {
    const key = item.supplier.trim();
    groups.set(key, [...(groups.get(key) ?? []), item]);
  }
  return [...groups.entries()]
    .map(([supplier, list]) => ({
      supplier,
      items: [...list].sort((a, b) => a.code.localeCompare(b.code)),
      totalCents: list.reduce((sum, i) => sum + i.orderCostCents, 0),
    }))
    .sort((a, b) => (a.supplier === '') !== (b.supplier === '') ? (a.supplier === '' ? 1 : -1) : a.supplier.localeCompare(b.supplier));
}
