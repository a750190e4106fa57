import { asc, ne } from 'drizzle-orm';
import type { CatalogueTool } from '@shared/schemas/offline';
import type { Database, Executor } from '../../db/client';
import { tools } from '../../db/schema/tools';
import { listActiveGrants } from './signoffs.repo';
import { effectiveLoanDays, toolIdentity } from './tool-dto';
import { accessoryList } from './missing-accessories';
import { loadToolExtras } from './tools.repo';

/** Every tool a scan may find (all but retired ones), as a phone keeps it for offline use: four queries in all (no photo ids). */
export function catalogueTools(db: Database): CatalogueTool[] {
  const rows = db.select().from(tools).where(ne(tools.status, 'retired')).orderBy(asc(tools.code)).all();
  const extras = loadToolExtras(db, rows, { withPhotos: false });
  return rows.map((row) => {
    const loan = extras.loans.get(row.id);
    return {
      ...toolIdentity(row),
      accessories: JSON.parse(row.accessories) as string[],
      loanDays: effectiveLoanDays(row),
      requiredSignoffId: row.requiredSignoffId,
      requiredSignoffName: row.requiredSignoffId !== null ? (extras.signoffNames.get(row.requiredSignoffId) ?? null) : null,
      holder: loan ? { id: loan.holderId, name: loan.holderName } : null,
      dueAt: loan ? loan.dueAt.toISOString() : null,
      accessoriesOut: loan ? accessoryList(loan.accessoriesOut) : null,
      heldFor: row.status === 'held' ? (extras.holds.get(row.id)?.offeredTo ?? null) : null,
      traySize: row.traySize,
      trayCapacity: row.trayCapacity,
    };
  });
}

/** The sign-offs a person holds now (not revoked). */
export function signoffIdsOf(db: Executor, userId: number): number[] {
  return listActiveGrants(db, { userId }).map((g) => g.signoffId);
}
