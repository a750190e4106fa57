import { findDrill } from '@shared/drills/drill-sizes';
import type { Tool } from '@shared/schemas/tools';
import { DEFAULT_LOAN_DAYS } from '@shared/tools/categories';
import { accessoryList } from './missing-accessories';
import type { ToolExtras, ToolRow } from './tools.repo';
import { DAY_MS } from '@shared/time/durations';


export function effectiveLoanDays(row: Pick<ToolRow, 'loanDays' | 'category'>): number {
  return row.loanDays ?? DEFAULT_LOAN_DAYS[row.category];
}

export function serviceDueAt(row: Pick<ToolRow, 'serviceIntervalDays' | 'lastServiceAt' | 'createdAt'>): Date | null {
  if (!row.serviceIntervalDays) return null;
  return new Date((row.lastServiceAt ?? row.createdAt).getTime() + row.serviceIntervalDays * DAY_MS);
}

/** What every list of tools says of each: its code and name, kind, where it lives, and its state. */
export function toolIdentity(row: Pick<ToolRow, 'code' | 'name' | 'category' | 'location' | 'status'>) {
  return { code: row.code, name: row.name, category: row.category, location: row.location, status: row.status };
}

export function toTool(row: ToolRow, extras: ToolExtras): Tool {
  const loan = extras.loans.get(row.id);
  const hold = extras.holds.get(row.id);
  const drill = row.drillSize ? findDrill(row.drillSize) : undefined;
  return {
    id: row.id,
    code: row.code,
    name: row.name,
    category: row.category,
    location: row.location,
    replacementValueCents: row.replacementValueCents,
    loanDays: effectiveLoanDays(row),
    loanDaysOverride: row.loanDays,
    requiredSignoff: row.requiredSignoffId !== null ? { id: row.requiredSignoffId, name: extras.signoffNames.get(row.requiredSignoffId) ?? 'sign-off' } : null,
    serviceIntervalDays: row.serviceIntervalDays,
    lastServiceAt: row.lastServiceAt?.toISOString() ?? null,
    serviceDueAt: serviceDueAt(row)?.toISOString() ?? null,
    status: row.status,
    statusNote: row.statusNote,
    drillSize: drill ? { name: drill.name, inch: drill.inch, mm: drill.mm } : null,
    rivetDiameter32: row.rivetDiameter32,
    traySize: (row.traySize as Tool['traySize']) ?? null,
    trayCapacity: row.trayCapacity,
    accessories: JSON.parse(row.accessories) as string[],
    notes: row.notes,
    loan: loan
      ? {
          id: loan.id,
          holder: { id: loan.holderId, name: loan.holderName },
          checkedOutAt: loan.checkedOutAt.toISOString(),
          dueAt: loan.dueAt.toISOString(),
          accessoriesOut: accessoryList(loan.accessoriesOut),
        }
      : null,
    missingAccessories: extras.missingAccessories.get(row.id) ?? [],
    holds: {
      waiting: hold?.waiting ?? 0,
      offeredTo: hold?.offeredTo ?? null,
      offerExpiresAt: hold?.offerExpiresAt?.toISOString() ?? null,
    },
    photoIds: extras.photoIds.get(row.id) ?? [],
  };
}
