import { and, asc, eq, lte } from 'drizzle-orm';
import type { ServiceContext } from '../../context';
import { holds, tools } from '../../db/schema/tools';
import { users, type UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { holdOfferedMail } from '../../mail/messages';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { readCribSettings } from '../../settings/crib-settings';
import { recordToolEvent } from './tool-events.repo';
import { findActiveHold, findToolByCode, openLoanHolderId, queuePosition, type ToolRow } from './tools.repo';

const HOUR_MS = 60 * 60 * 1000;

export interface Offer {
  userId: number;
  name: string;
  notify: () => Promise<void>;
}

/**
 * Offers a tool that just became free to the first person waiting, holding it for them for the
 * chapter's hold time. Returns undefined when nobody waits. Runs inside the caller's transaction;
 * the e-mail goes out afterwards through `notify`.
 */
export function offerToNextInQueue(ctx: ServiceContext, tool: ToolRow, now: Date): Offer | undefined {
  const next = ctx.db
    .select({ id: holds.id, userId: holds.userId, name: users.name, email: users.email })
    .from(holds)
    .innerJoin(users, eq(users.id, holds.userId))
    .where(and(eq(holds.toolId, tool.id), eq(holds.status, 'waiting')))
    .orderBy(asc(holds.createdAt), asc(holds.id))
    .get();
  if (!next) return undefined;
  const until = new Date(now.getTime() + readCribSettings(ctx.db).holdHours * HOUR_MS);
  ctx.db.update(holds).set({ status: 'offered', offeredAt: now, offerExpiresAt: until }).where(eq(holds.id, next.id)).run();
  ctx.db.update(tools).set({ status: 'held', statusNote: null, updatedAt: now }).where(eq(tools.id, tool.id)).run();
  recordToolEvent(ctx.db, { toolId: tool.id, actorId: null, at: now, action: 'held', fromStatus: tool.status, toStatus: 'held', detail: `Held for ${next.name} until ${until.toISOString()}` });
  const link = `${ctx.publicUrl.replace(/\/$/, '')}/tools/${tool.code}`;
  return {
    userId: next.userId,
    name: next.name,
    notify: () => ctx.mailer.send(holdOfferedMail(next.email, next.name, tool, until, link, { zone: readChapterTimeZone(ctx.db), now })),
  };
}

/**
 * Joins the queue for a tool someone else has; a tool on the shelf is set aside for this person
 * at once (held for the chapter's hold time), as when a member reserves the kit for an assembly.
 */
export function placeHold(ctx: ServiceContext, user: UserRow, code: string) {
  const now = ctx.now();
  return ctx.db.transaction(() => {
    const tool = findToolByCode(ctx.db, code);
    if (!tool) throw new HttpError(404, 'TOOL_NOT_FOUND', `No tool has the code ${code}.`);
    if (tool.status === 'available') return setAside(ctx, tool, user, now);
    if (tool.status === 'lost' || tool.status === 'retired') {
      throw new HttpError(409, 'TOOL_UNAVAILABLE', `${tool.code} is ${tool.status === 'lost' ? 'marked lost' : 'retired'}; a hold would never be filled.`);
    }
    if (findActiveHold(ctx.db, tool.id, user.id)) throw new HttpError(409, 'HOLD_EXISTS', `You are already in the queue for ${tool.code}.`);
    if (openLoanHolderId(ctx.db, tool.id) === user.id) throw new HttpError(409, 'YOU_HOLD_IT', `You have ${tool.code} on loan already.`);
    const hold = ctx.db.insert(holds).values({ toolId: tool.id, userId: user.id, createdAt: now }).returning().get();
    recordToolEvent(ctx.db, { toolId: tool.id, actorId: user.id, at: now, action: 'hold_placed', detail: `${user.name} joined the queue` });
    return { id: hold.id, code: tool.code, status: hold.status, position: queuePosition(ctx.db, tool.id, hold.id) };
  });
}

function setAside(ctx: ServiceContext, tool: ToolRow, user: UserRow, now: Date) {
  const until = new Date(now.getTime() + readCribSettings(ctx.db).holdHours * HOUR_MS);
  const hold = ctx.db.insert(holds).values({ toolId: tool.id, userId: user.id, createdAt: now, status: 'offered', offeredAt: now, offerExpiresAt: until }).returning().get();
  ctx.db.update(tools).set({ status: 'held', statusNote: null, updatedAt: now }).where(eq(tools.id, tool.id)).run();
  recordToolEvent(ctx.db, { toolId: tool.id, actorId: user.id, at: now, action: 'held', fromStatus: 'available', toStatus: 'held', detail: `Set aside for ${user.name} until ${until.toISOString()}` });
  return { id: hold.id, code: tool.code, status: hold.status, position: 1 };
}

export async function cancelHold(ctx: ServiceContext, user: UserRow, code: string): Promise<void> {
  const now = ctx.now();
  const offer = ctx.db.transaction(() => {
    const tool = findToolByCode(ctx.db, code);
    if (!tool) throw new HttpError(404, 'TOOL_NOT_FOUND', `No tool has the code ${code}.`);
    const hold = findActiveHold(ctx.db, tool.id, user.id);
    if (!hold) throw new HttpError(404, 'HOLD_NOT_FOUND', `You have no hold on ${tool.code}.`);
    ctx.db.update(holds).set({ status: 'cancelled', closedAt: now }).where(eq(holds.id, hold.id)).run();
    recordToolEvent(ctx.db, { toolId: tool.id, actorId: user.id, at: now, action: 'hold_cancelled', detail: `${user.name} left the queue` });
    if (hold.status !== 'offered') return undefined;
    return releaseHeldTool(ctx, tool, now);
  });
  await offer?.notify();
}

/** A held tool whose offer ended goes to the next person waiting, or back on the shelf. */
function releaseHeldTool(ctx: ServiceContext, tool: ToolRow, now: Date): Offer | undefined {
  const offer = offerToNextInQueue(ctx, tool, now);
  if (!offer) {
    ctx.db.update(tools).set({ status: 'available', statusNote: null, updatedAt: now }).where(eq(tools.id, tool.id)).run();
    recordToolEvent(ctx.db, { toolId: tool.id, actorId: null, at: now, action: 'hold_released', fromStatus: 'held', toStatus: 'available', detail: 'Nobody else is waiting' });
  }
  return offer;
}

/** Ends offers whose time ran out; the next person in each queue is offered the tool. */
export async function expireHoldOffers(ctx: ServiceContext): Promise<number> {
  const now = ctx.now();
  const offers = ctx.db.transaction(() => {
    const expired = ctx.db
      .select({ hold: holds, tool: tools, name: users.name })
      .from(holds)
      .innerJoin(tools, eq(tools.id, holds.toolId))
      .innerJoin(users, eq(users.id, holds.userId))
      .where(and(eq(holds.status, 'offered'), lte(holds.offerExpiresAt, now)))
      .all();
    return expired.map(({ hold, tool, name }) => {
      ctx.db.update(holds).set({ status: 'expired', closedAt: now }).where(eq(holds.id, hold.id)).run();
      recordToolEvent(ctx.db, { toolId: tool.id, actorId: null, at: now, action: 'hold_expired', detail: `${name} did not collect it in time` });
      return releaseHeldTool(ctx, tool, now);
    });
  });
  await Promise.allSettled(offers.flatMap((o) => (o ? [o.notify()] : [])));
  return offers.length;
}
