import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { endHoldsForToolOutOfUse, offerToNextInQueue } from './holds.service';
import { closeLoanOfLostTool } from './loans.repo';
import { actedBy, recordToolEvent } from './tool-events.repo';
import { moveTool, refusalOf, type ToolStateEvent } from './tool-state';
import { findToolByCode, updateTool } from './tools.repo';

export type StatusCommand = 'out_of_service' | 'back_in_service' | 'lost' | 'found' | 'retire';

/** Each quartermaster command is one event of the tool's state table. */
const EVENT_OF: Record<StatusCommand, ToolStateEvent> = {
  out_of_service: 'take_out_of_service',
  back_in_service: 'back_in_service',
  lost: 'mark_lost',
  found: 'found',
  retire: 'retire',
};

/**
 * Quartermaster commands that move a tool between states, each with a reason in the audit trail.
 * A tool on loan must come back before it can go out of service or be retired. Marking a tool on
 * loan lost closes its loan with the reason, so the record says who had it last. A held tool going
 * out of use ends its offer (and, lost or retired, its queue), telling those waiting; a tool coming
 * back into use goes to the first person waiting.
 */
export function changeToolStatus(ctx: ServiceContext, actor: UserRow, code: string, command: StatusCommand, note: string, serviced = false) {
  const now = ctx.now();
  const event = EVENT_OF[command];
  const { toolCode, status } = ctx.db.transaction(() => {
    const tool = findToolByCode(ctx.db, code);
    if (!tool) throw new HttpError(404, 'TOOL_NOT_FOUND', `No tool has the code ${code}.`);
    const refusal = refusalOf(tool, event);
    if (refusal) throw new HttpError(409, 'WRONG_STATE', refusal);
    if (event === 'mark_lost' && tool.status === 'on_loan') closeLoanOfLostTool(ctx.db, tool.id, now, actor.id, note);
    if (event === 'take_out_of_service' || event === 'mark_lost' || event === 'retire') endHoldsForToolOutOfUse(ctx, tool, event, now);
    const moved = moveTool(ctx.db, tool, event, { ...actedBy(ctx, actor), at: now, detail: note });
    if (serviced) {
      updateTool(ctx.db, tool.id, { lastServiceAt: now });
      recordToolEvent(ctx.db, { toolId: tool.id, ...actedBy(ctx, actor), at: now, action: 'serviced', detail: note });
    }
    const offer = moved.status === 'available' ? offerToNextInQueue(ctx, { ...tool, status: moved.status }, now) : undefined;
    return { toolCode: tool.code, status: offer ? 'held' : moved.status };
  });
  return { code: toolCode, status };
}
