/**
 * The tools feature's read models: what other features may read of the tables it owns (tools,
 * loans, holds, tool events, photos, sign-offs and their requests, missing accessories, loan
 * reminders). Another feature imports this file and nothing else of tools.
 */
import { and, asc, eq, inArray, ne, notInArray } from 'drizzle-orm';
import type { CatalogueTool, OfflineLoan } from '@shared/schemas/offline';
import type { ToolCategory } from '@shared/tools/categories';
import type { Database, Executor } from '../../db/client';
import { holds, tools } from '../../db/schema/tools';
import { accessoryList } from './missing-accessories';
import { listActiveGrants } from './signoffs.repo';
import { effectiveLoanDays, toolIdentity } from './tool-dto';
import { loadToolExtras } from './tools.repo';

// for planning

/** A tool that could go in a kit, as the crib-kit picker weighs it (accessories as listed on the tool). */
export interface KitCandidateTool {
  id: number;
  code: string;
  name: string;
  status: string;
  category: ToolCategory;
  accessories: string[];
  drillSize: string | null;
  rivetDiameter32: number | null;
  traySize: string | null;
  trayCapacity: number | null;
}

/** The tools of these categories that could join a kit: all but lost and retired ones. */
export function kitCandidateTools(db: Executor, categories: readonly ToolCategory[]): KitCandidateTool[] {
  return db
    .select({ id: tools.id, code: tools.code, name: tools.name, status: tools.status, category: tools.category, accessories: tools.accessories, drillSize: tools.drillSize, rivetDiameter32: tools.rivetDiameter32, traySize: tools.traySize, trayCapacity: tools.trayCapacity })
    .from(tools)
    .where(and(inArray(tools.category, [...categories]), notInArray(tools.status, ['lost', 'retired'])))
    .all()
    .map((t) => ({ ...t, accessories: JSON.parse(t.accessories) as string[] }));
}

/** The ids of the tools set aside for this person now (their hold was offered). */
export function toolIdsOfferedTo(db: Executor, userId: number): Set<number> {
  return new Set(
    db
      .select({ toolId: holds.toolId })
      .from(holds)
      .where(and(eq(holds.userId, userId), eq(holds.status, 'offered')))
      .all()
      .map((h) => h.toolId),
  );
}

// for labels

/** The names of the tools with these codes, by code; codes that match no tool are absent. */
export function toolNamesByCode(db: Executor, codes: readonly string[]): Map<string, string> {
  const unique = [...new Set(codes)];
  if (unique.length === 0) return new Map();
  const rows = db.select({ code: tools.code, name: tools.name }).from(tools).where(inArray(tools.code, unique)).all();
  return new Map(rows.map((r) => [r.code, r.name]));
}

// for offline

/**
 * Who has which tool out, from the catalogue's own tools: one rule for the phone's copy (the member's
 * loans) and the station's (each badge holder's), so the two copies always agree.
 */
export function loansByHolder(catalogue: CatalogueTool[]): Map<number, OfflineLoan[]> {
  const loans = new Map<number, OfflineLoan[]>();
  for (const tool of catalogue) {
    if (tool.status !== 'on_loan' || !tool.holder || !tool.dueAt) continue;
    const held = loans.get(tool.holder.id) ?? [];
    held.push({ code: tool.code, dueAt: tool.dueAt });
    loans.set(tool.holder.id, held);
  }
  return loans;
}

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

/** The sign-offs each of these people holds now (not revoked), by person: one query; someone holding none is absent. */
export function signoffIdsByPerson(db: Executor, userIds: readonly number[]): Map<number, number[]> {
  const byPerson = new Map<number, number[]>();
  if (userIds.length === 0) return byPerson;
  for (const g of listActiveGrants(db, { userIds })) {
    const held = byPerson.get(g.userId);
    if (held) held.push(g.signoffId);
    else byPerson.set(g.userId, [g.signoffId]);
  }
  return byPerson;
}
