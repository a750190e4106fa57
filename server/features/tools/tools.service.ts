import { hasRole } from '@shared/roles';
import { loanDueAt } from '@shared/time/chapter-time';
import type { CreateToolInput, Tool, ToolAction, ToolEvent, ToolForYou, ToolList, ToolListQuery, UpdateToolBody } from '@shared/schemas/tools';
import { createToolBodySchema } from '@shared/schemas/tools';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { loanStatements } from './loans.repo';
import { signOffAdvice } from './signoffs.service';
import { listToolEvents, actedBy, recordToolEvent } from './tool-events.repo';
import { toTool } from './tool-dto';
import { heldWords, loanWords } from '@shared/tools/tool-words';
import {
  findActiveHold,
  findToolByCode,
  insertTool,
  listTools,
  loadToolExtras,
  nextToolCode,
  queuePosition,
  signoffExists,
  updateTool,
  type ToolRow,
} from './tools.repo';


export function listToolPage(ctx: ServiceContext, query: ToolListQuery): ToolList {
  const { rows, total } = listTools(ctx.db, query);
  const extras = loadToolExtras(ctx.db, rows);
  return { data: rows.map((r) => toTool(r, extras)), meta: { total, page: query.page, pageSize: query.pageSize } };
}

export function getToolRow(ctx: ServiceContext, code: string): ToolRow {
  const row = findToolByCode(ctx.db, code);
  if (!row) throw new HttpError(404, 'TOOL_NOT_FOUND', `No tool has the code ${code}. Check the label, or type the code.`);
  return row;
}

/** A tool's audit trail, newest first. */
export function toolHistory(ctx: ServiceContext, code: string): ToolEvent[] {
  return listToolEvents(ctx.db, getToolRow(ctx, code).id);
}

export function getTool(ctx: ServiceContext, code: string): Tool {
  const row = getToolRow(ctx, code);
  return toTool(row, loadToolExtras(ctx.db, [row]));
}

/** The tool plus what the signed-in person may do with it now, or why not. */
export function getToolForYou(ctx: ServiceContext, user: UserRow, code: string): ToolForYou {
  const tool = getTool(ctx, code);
  const myHold = findActiveHold(ctx.db, tool.id, user.id);
  const actions: ToolAction[] = [];
  let reason: string | null = null;
  const mine = tool.loan?.holder.id === user.id;
  const now = ctx.now();
  const zone = readChapterTimeZone(ctx.db);
  switch (tool.status) {
    case 'available':
      actions.push('check_out');
      break;
    case 'on_loan':
      if (mine || hasRole(user.role, 'quartermaster')) actions.push('return');
      if (!mine) {
        reason = tool.loan ? loanWords({ name: tool.loan.holder.name, you: false }, new Date(tool.loan.dueAt), now, zone) : 'On loan.';
        if (!myHold) actions.push('place_hold');
      }
      break;
    case 'held':
      if (tool.holds.offeredTo?.id === user.id) actions.push('check_out');
      else {
        reason = heldWords(tool.holds.offeredTo?.name ?? 'the next person', tool.holds.offerExpiresAt ? new Date(tool.holds.offerExpiresAt) : null, zone);
        if (!myHold) actions.push('place_hold');
      }
      break;
    case 'out_of_service':
      reason = `Out of service${tool.statusNote ? `: ${tool.statusNote}` : ''}.`;
      if (!myHold) actions.push('place_hold');
      break;
    case 'lost':
      reason = 'Marked lost. Tell the quartermaster if you find it.';
      break;
    case 'retired':
      reason = 'Retired from the crib.';
      break;
  }
  if (myHold) actions.push('cancel_hold');
  if (tool.requiredSignoff && !loanStatements(ctx.db).hasSignoff.get({ signoffId: tool.requiredSignoff.id, userId: user.id })) {
    const before = actions.length;
    for (const needsIt of ['check_out', 'place_hold'] as const) if (actions.includes(needsIt)) actions.splice(actions.indexOf(needsIt), 1);
    if (actions.length < before) reason = `Needs the "${tool.requiredSignoff.name}" sign-off, which you do not have yet. ${signOffAdvice(ctx.db)}`;
  }
  return {
    ...tool,
    forYou: {
      actions,
      reason,
      defaultDueAt: loanDueAt(now, tool.loanDays, zone).toISOString(),
      yourHold: myHold
        ? {
            status: myHold.status as 'waiting' | 'offered',
            position: queuePosition(ctx.db, tool.id, myHold.id),
            offerExpiresAt: myHold.offerExpiresAt?.toISOString() ?? null,
            startsAt: myHold.startsAt && myHold.startsAt > now ? myHold.startsAt.toISOString() : null,
          }
        : null,
    },
  };
}

function checkSignoff(ctx: ServiceContext, id: number | null | undefined) {
  if (id != null && !signoffExists(ctx.db, id)) {
    throw new HttpError(400, 'SIGNOFF_NOT_FOUND', `No sign-off has id ${id}.`, [{ path: 'requiredSignoffId', message: 'Choose a sign-off from the list.' }]);
  }
}

function toRowValues(body: UpdateToolBody) {
  const { lastServiceAt, accessories, ...rest } = body;
  return {
    ...rest,
    ...(lastServiceAt !== undefined && { lastServiceAt: lastServiceAt ? new Date(lastServiceAt) : null }),
    ...(accessories !== undefined && { accessories: JSON.stringify(accessories) }),
  };
}

export function createTool(ctx: ServiceContext, actor: UserRow, input: CreateToolInput): Tool {
  checkSignoff(ctx, input.requiredSignoffId);
  const now = ctx.now();
  const row = ctx.db.transaction(() => {
    const code = input.code ?? nextToolCode(ctx.db);
    if (findToolByCode(ctx.db, code)) throw new HttpError(409, 'CODE_TAKEN', `${code} is already on another tool's label.`, [{ path: 'code', message: 'Pick another code.' }]);
    const { code: _ignored, lastServiceAt, accessories, ...fields } = input;
    const created = insertTool(ctx.db, {
      ...fields,
      code,
      lastServiceAt: lastServiceAt ? new Date(lastServiceAt) : null,
      accessories: JSON.stringify(accessories),
      createdAt: now,
      updatedAt: now,
    });
    recordToolEvent(ctx.db, { toolId: created.id, ...actedBy(ctx, actor), at: now, action: 'added', toStatus: 'available', detail: `Added as ${created.name}` });
    return created;
  });
  return getTool(ctx, row.code);
}

export function editTool(ctx: ServiceContext, actor: UserRow, code: string, change: UpdateToolBody): Tool {
  checkSignoff(ctx, change.requiredSignoffId);
  const now = ctx.now();
  ctx.db.transaction(() => {
    const row = getToolRow(ctx, code);
    const merged = { ...row, ...toRowValues(change) };
    const check = createToolBodySchema.safeParse({
      category: merged.category,
      name: merged.name,
      drillSize: merged.drillSize,
      rivetDiameter32: merged.rivetDiameter32,
      traySize: merged.traySize,
      trayCapacity: merged.trayCapacity,
    });
    if (!check.success) {
      const issues = check.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
      throw new HttpError(400, 'VALIDATION_FAILED', `The tool would not be valid: ${issues.map((i) => i.message).join(' ')}`, issues);
    }
    updateTool(ctx.db, row.id, { ...toRowValues(change), updatedAt: now });
    recordToolEvent(ctx.db, { toolId: row.id, ...actedBy(ctx, actor), at: now, action: 'edited', detail: `Changed ${Object.keys(change).join(', ')}` });
  });
  return getTool(ctx, code);
}

