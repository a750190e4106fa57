import { and, asc, eq, inArray, isNull, sql } from 'drizzle-orm';
import type { MissingAccessory, ResolveAccessoryBody } from '@shared/schemas/tools';
import type { ServiceContext } from '../../context';
import type { Database, Executor } from '../../db/client';
import { preparedPerDatabase } from '../../db/prepared';
import { loans, missingAccessories, tools } from '../../db/schema/tools';
import { users, type UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { actedBy, recordToolEvent } from './tool-events.repo';
import { loanStatements } from './loans.repo';

/**
 * The one writer of `missing_accessories`: an accessory that went out with a loan and did not come
 * back is open from the return until the quartermaster marks it found or replaced.
 */

/** Parses a stored list of accessories (a loan's `accessories_out`); null stays null (not recorded). */
export const accessoryList = (json: string | null): string[] | null => (json === null ? null : (JSON.parse(json) as string[]));

/** Records what did not come back with a loan, in the return's transaction. */
export function recordMissingAccessories(db: Executor, e: { toolId: number; loanId: number; accessories: readonly string[]; at: Date }): void {
  for (const accessory of e.accessories) {
    db.insert(missingAccessories).values({ toolId: e.toolId, loanId: e.loanId, accessory, reportedAt: e.at }).onConflictDoNothing().run();
  }
}

const openSelect = { toolId: missingAccessories.toolId, accessory: missingAccessories.accessory, reportedAt: missingAccessories.reportedAt, holderId: loans.userId, holderName: users.name };
const p = sql.placeholder;

const statements = preparedPerDatabase((db: Database) => ({
  openForTool: db
    .select(openSelect)
    .from(missingAccessories)
    .innerJoin(loans, eq(loans.id, missingAccessories.loanId))
    .innerJoin(users, eq(users.id, loans.userId))
    .where(and(eq(missingAccessories.toolId, p('toolId')), isNull(missingAccessories.resolvedAt)))
    .orderBy(asc(missingAccessories.id))
    .prepare(),
}));

type OpenRow = { toolId: number; accessory: string; reportedAt: Date; holderId: number; holderName: string };

/** Open missing accessories per tool: a prepared query for one tool (a scan), one query for a page. */
export function openMissingAccessories(db: Database, toolIds: readonly number[]): Map<number, MissingAccessory[]> {
  const rows: OpenRow[] =
    toolIds.length === 1
      ? statements(db).openForTool.all({ toolId: toolIds[0] })
      : toolIds.length === 0
        ? []
        : db
            .select(openSelect)
            .from(missingAccessories)
            .innerJoin(loans, eq(loans.id, missingAccessories.loanId))
            .innerJoin(users, eq(users.id, loans.userId))
            .where(and(inArray(missingAccessories.toolId, [...toolIds]), isNull(missingAccessories.resolvedAt)))
            .orderBy(asc(missingAccessories.id))
            .all();
  const byTool = new Map<number, MissingAccessory[]>();
  for (const r of rows) {
    byTool.set(r.toolId, [...(byTool.get(r.toolId) ?? []), { accessory: r.accessory, reportedAt: r.reportedAt.toISOString(), lastHolder: { id: r.holderId, name: r.holderName } }]);
  }
  return byTool;
}

/** Every tool with an accessory still missing, by code, with what is missing and who last had it. A read only. */
export function toolsMissingAccessories(db: Database): { code: string; name: string; missing: MissingAccessory[] }[] {
  const withMissing = db
    .selectDistinct({ id: tools.id, code: tools.code, name: tools.name })
    .from(missingAccessories)
    .innerJoin(tools, eq(tools.id, missingAccessories.toolId))
    .where(isNull(missingAccessories.resolvedAt))
    .orderBy(asc(tools.code))
    .all();
  const open = openMissingAccessories(db, withMissing.map((t) => t.id));
  return withMissing.map((t) => ({ code: t.code, name: t.name, missing: open.get(t.id) ?? [] }));
}

/** What did not come back with each of these loans (found or replaced since, or not). */
export function missingPerLoan(db: Executor, loanIds: readonly number[]): Map<number, string[]> {
  if (loanIds.length === 0) return new Map();
  const rows = db
    .select({ loanId: missingAccessories.loanId, accessory: missingAccessories.accessory })
    .from(missingAccessories)
    .where(inArray(missingAccessories.loanId, [...loanIds]))
    .orderBy(asc(missingAccessories.id))
    .all();
  const byLoan = new Map<number, string[]>();
  for (const r of rows) byLoan.set(r.loanId, [...(byLoan.get(r.loanId) ?? []), r.accessory]);
  return byLoan;
}

/** The quartermaster marks a missing accessory found or replaced; the tool's trail says so. */
export function resolveMissingAccessory(ctx: ServiceContext, actor: UserRow, code: string, body: ResolveAccessoryBody): MissingAccessory[] {
  const now = ctx.now();
  return ctx.db.transaction(() => {
    const tool = loanStatements(ctx.db).toolByCode.get({ code });
    if (!tool) throw new HttpError(404, 'TOOL_NOT_FOUND', `No tool has the code ${code}.`);
    const closed = ctx.db
      .update(missingAccessories)
      .set({ resolvedAt: now, resolvedById: actor.id, resolution: body.resolution })
      .where(and(eq(missingAccessories.toolId, tool.id), eq(missingAccessories.accessory, body.accessory), isNull(missingAccessories.resolvedAt)))
      .run();
    if (closed.changes === 0) {
      throw new HttpError(404, 'ACCESSORY_NOT_MISSING', `${body.accessory} is not missing from ${tool.code}.`, [{ path: 'accessory', message: 'Choose one of the missing accessories.' }]);
    }
    recordToolEvent(ctx.db, {
      toolId: tool.id,
      ...actedBy(ctx, actor),
      at: now,
      action: body.resolution === 'found' ? 'accessory_found' : 'accessory_replaced',
      detail: `${body.accessory} ${body.resolution === 'found' ? 'found' : 'replaced'}`,
    });
    return openMissingAccessories(ctx.db, [tool.id]).get(tool.id) ?? [];
  });
}
