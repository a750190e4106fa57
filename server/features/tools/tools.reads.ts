/**
 * The tools feature's read models: what other features may read of the tables it owns (tools,
 * loans, holds, tool events, photos, sign-offs and their requests, missing accessories, loan
 * reminders). Another feature imports this file and nothing else of tools.
 */
import { and, eq, inArray, notInArray } from 'drizzle-orm';
import type { ToolCategory } from '@shared/tools/categories';
import type { Executor } from '../../db/client';
import { holds, tools } from '../../db/schema/tools';

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
