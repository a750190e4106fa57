import { and, eq, isNull } from 'drizzle-orm';
import { STATUS_LABELS } from '@shared/tools/categories';
import type { ServiceContext } from '../../context';
import { loans, tools } from '../../db/schema/tools';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { offerToNextInQueue } from './holds.service';
import { recordToolEvent } from './tool-events.repo';
import { findToolByCode, type ToolRow } from './tools.repo';

export type StatusCommand = 'out_of_service' | 'back_in_service' | 'lost' | 'found' | 'retire';

/** Which states each command may start from, and where it leads. */
const COMMANDS: Record<StatusCommand, { from: ToolRow['status'][]; to: ToolRow['status']; action: string }> = {
  out_of_service: { from: ['available', 'held'], to: 'out_of_service', action: 'out_of_service' },
  back_in_service: { from: ['out_of_service'], to: 'available', action: 'back_in_service' },
  lost: { from: ['available', 'on_loan', 'held', 'out_of_service'], to: 'lost', action: 'lost' },
  found: { from: ['lost'], to: 'available', action: 'found' },
  retire: { from: ['available', 'out_of_service', 'lost'], to: 'retired', action: 'retired' },
};


/**
 * Quartermaster commands that move a tool between states, each with a reason in the audit trail.
 * A tool on loan must come back before it can go out of service or be retired. Marking a tool on
 * loan lost closes its loan with the reason, so the record says who had it last.
 */
export function changeToolStatus(ctx: ServiceContext, actor: UserRow, code: string, command: StatusCommand, note: string, serviced = false) {
  const now = ctx.now();
  const rule = COMMANDS[command];
  const { tool, offer } = ctx.db.transaction(() => {
    const tool = findToolByCode(ctx.db, code);
    if (!tool) throw new HttpError(404, 'TOOL_NOT_FOUND', `No tool has the code ${code}.`);
    if (!rule.from.includes(tool.status)) {
      throw new HttpError(409, 'WRONG_STATE', `${tool.code} is ${STATUS_LABELS[tool.status].toLowerCase()}, so it cannot be ${command.replaceAll('_', ' ')} now.`);
    }
    if (command === 'lost' && tool.status === 'on_loan') {
      ctx.db
        .update(loans)
        .set({ returnedAt: now, returnedById: actor.id, returnCondition: 'needs_attention', returnNote: `Marked lost: ${note}` })
        .where(and(eq(loans.toolId, tool.id), isNull(loans.returnedAt)))
        .run();
    }
    const becomesFree = rule.to === 'available';
    const offer = becomesFree ? offerToNextInQueue(ctx, tool, now) : undefined;
    const to = offer ? 'held' : rule.to;
    if (!offer) {
      ctx.db
        .update(tools)
        .set({ status: to, statusNote: to === 'available' ? null : note, updatedAt: now, ...(serviced && { lastServiceAt: now }) })
        .where(eq(tools.id, tool.id))
        .run();
    } else if (serviced) {
      ctx.db.update(tools).set({ lastServiceAt: now }).where(eq(tools.id, tool.id)).run();
    }
    recordToolEvent(ctx.db, { toolId: tool.id, actorId: actor.id, at: now, action: rule.action, fromStatus: tool.status, toStatus: rule.to, detail: note });
    if (serviced) recordToolEvent(ctx.db, { toolId: tool.id, actorId: actor.id, at: now, action: 'serviced', detail: note });
    return { tool, offer };
  });
  return { code: tool.code, status: offer ? 'held' : rule.to };
}
