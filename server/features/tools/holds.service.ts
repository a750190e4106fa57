import { dayInWords, momentInWords } from '@shared/time/chapter-time';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { holdEndedMail, holdOfferedMail } from '../../mail/messages';
import { queueMail } from '../../mail/outbox';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { readCribSettings } from '../../settings/crib-settings';
import {
  ACTIVE_HOLD_STATUSES,
  activeHoldsOfPerson,
  closeHold,
  firstWaitingHold,
  holdsOnTool,
  insertHold,
  lapsedOffers,
  markHoldOffered,
  shelvedToolsWithHoldsBegun,
  withdrawOffer,
} from './holds.repo';
import { refuseWithoutSignoff } from './signoffs.service';
import { actedBy, recordToolEvent } from './tool-events.repo';
import { moveTool, type ToolStateEvent } from './tool-state';
import { findActiveHold, findToolByCode, findToolById, openLoanHolderId, queuePosition, type ToolRow } from './tools.repo';

import { HOUR_MS } from '@shared/time/durations';

export interface Offer {
  userId: number;
  name: string;
}

const toolLink = (ctx: ServiceContext, code: string) => `${ctx.publicUrl.replace(/\/$/, '')}/tools/${code}`;
const offerEnds = (ctx: ServiceContext, now: Date) => new Date(now.getTime() + readCribSettings(ctx.db).holdHours * HOUR_MS);

/**
 * Offers a tool that is free (on the shelf, or held for someone whose offer just ended) to the first
 * active person waiting whose hold has begun, holding it for them for the chapter's hold time, and
 * writes their e-mail to the outbox. Returns undefined when nobody waits. Runs inside the caller's
 * transaction, so the offer and its e-mail are kept together.
 */
export function offerToNextInQueue(ctx: ServiceContext, tool: ToolRow, now: Date): Offer | undefined {
  const next = firstWaitingHold(ctx.db, tool.id, now);
  if (!next) return undefined;
  const until = offerEnds(ctx, now);
  markHoldOffered(ctx.db, next.hold.id, now, until);
  const event: ToolStateEvent = tool.status === 'held' ? 'pass_offer' : 'offer';
  const zone = readChapterTimeZone(ctx.db);
  moveTool(ctx.db, tool, event, { actorId: null, at: now, detail: `Set aside for ${next.name} until ${momentInWords(until, zone)}` });
  queueMail(ctx.db, holdOfferedMail(next.email, next.name, tool, until, toolLink(ctx, tool.code), { zone, now }), now);
  return { userId: next.hold.userId, name: next.name };
}

export interface PlaceHoldOptions {
  /** Hold from this moment (an assembly's planned start): until then the tool is not set aside. */
  from?: Date;
}

/**
 * Joins the queue for a tool; a tool on the shelf is set aside for this person at once (held for
 * the chapter's hold time), unless the hold starts later: then it waits, and the tool is offered
 * when the day comes (the crib's sweep) or when it comes back after that.
 */
export function placeHold(ctx: ServiceContext, user: UserRow, code: string, options: PlaceHoldOptions = {}) {
  const now = ctx.now();
  const from = options.from && options.from > now ? options.from : undefined;
  return ctx.db.transaction(() => {
    const tool = findToolByCode(ctx.db, code);
    if (!tool) throw new HttpError(404, 'TOOL_NOT_FOUND', `No tool has the code ${code}.`);
    if (tool.status === 'lost' || tool.status === 'retired') {
      throw new HttpError(409, 'TOOL_UNAVAILABLE', `${tool.code} is ${tool.status === 'lost' ? 'marked lost' : 'retired'}; a hold would never be filled.`);
    }
    refuseWithoutSignoff(ctx, tool, user);
    if (findActiveHold(ctx.db, tool.id, user.id)) throw new HttpError(409, 'HOLD_EXISTS', `You are already in the queue for ${tool.code}.`);
    if (openLoanHolderId(ctx.db, tool.id) === user.id) throw new HttpError(409, 'YOU_HOLD_IT', `You have ${tool.code} on loan already.`);
    if (tool.status === 'available' && !from) return setAside(ctx, tool, user, now);
    const hold = insertHold(ctx.db, { toolId: tool.id, userId: user.id, createdAt: now, startsAt: from ?? null });
    const when = from ? ` from ${dayInWords(from, readChapterTimeZone(ctx.db), now)}` : '';
    recordToolEvent(ctx.db, { toolId: tool.id, ...actedBy(ctx, user), at: now, action: 'hold_placed', detail: `${user.name} joined the queue${when}` });
    return { id: hold.id, code: tool.code, status: hold.status, position: queuePosition(ctx.db, tool.id, hold.id), startsAt: from?.toISOString() ?? null };
  });
}

function setAside(ctx: ServiceContext, tool: ToolRow, user: UserRow, now: Date) {
  const until = offerEnds(ctx, now);
  const hold = insertHold(ctx.db, { toolId: tool.id, userId: user.id, createdAt: now, status: 'offered', offeredAt: now, offerExpiresAt: until });
  moveTool(ctx.db, tool, 'offer', { ...actedBy(ctx, user), at: now, detail: `Set aside for ${user.name} until ${momentInWords(until, readChapterTimeZone(ctx.db))}` });
  return { id: hold.id, code: tool.code, status: hold.status, position: 1, startsAt: null };
}

export function cancelHold(ctx: ServiceContext, user: UserRow, code: string): void {
  const now = ctx.now();
  ctx.db.transaction(() => {
    const tool = findToolByCode(ctx.db, code);
    if (!tool) throw new HttpError(404, 'TOOL_NOT_FOUND', `No tool has the code ${code}.`);
    const hold = findActiveHold(ctx.db, tool.id, user.id);
    if (!hold) throw new HttpError(404, 'HOLD_NOT_FOUND', `You have no hold on ${tool.code}.`);
    closeHold(ctx.db, hold.id, 'cancelled', now);
    recordToolEvent(ctx.db, { toolId: tool.id, ...actedBy(ctx, user), at: now, action: 'hold_cancelled', detail: `${user.name} left the queue` });
    if (hold.status === 'offered') releaseHeldTool(ctx, tool.id, now);
  });
}

/**
 * An offer ended: the tool, if it is still held (and not, say, marked lost meanwhile), goes to the
 * next person waiting or back on the shelf. A tool no longer held is left as it is.
 */
function releaseHeldTool(ctx: ServiceContext, toolId: number, now: Date): Offer | undefined {
  const tool = findToolById(ctx.db, toolId);
  if (!tool || tool.status !== 'held') return undefined;
  const offer = offerToNextInQueue(ctx, tool, now);
  if (!offer) moveTool(ctx.db, tool, 'offer_ended', { actorId: null, at: now, detail: 'Nobody else is waiting' });
  return offer;
}

/** Ends offers whose time ran out (the next person in each queue is offered the tool), then starts holds whose day has come. */
export function expireHoldOffers(ctx: ServiceContext): number {
  const now = ctx.now();
  return ctx.db.transaction(() => {
    const expired = lapsedOffers(ctx.db, now);
    for (const { hold, name } of expired) {
      closeHold(ctx.db, hold.id, 'expired', now);
      recordToolEvent(ctx.db, { toolId: hold.toolId, actorId: null, at: now, action: 'hold_expired', detail: `${name} did not collect it in time` });
      releaseHeldTool(ctx, hold.toolId, now);
    }
    return expired.length + offerHoldsThatBegan(ctx, now).length;
  });
}

/** Tools on the shelf with someone whose hold from a later day has now begun: set aside for them. */
function offerHoldsThatBegan(ctx: ServiceContext, now: Date): Offer[] {
  return shelvedToolsWithHoldsBegun(ctx.db, now).flatMap((tool) => offerToNextInQueue(ctx, tool, now) ?? []);
}

/**
 * A tool goes out of use (out of service, lost, retired). Its offer ends: out of service, the person
 * it was held for goes back to the head of the queue (the tool should come back); lost or retired,
 * every hold on it ends. Everyone whose hold changed is told (through the outbox). Call before the
 * tool's own move, in the same transaction.
 */
export function endHoldsForToolOutOfUse(ctx: ServiceContext, tool: ToolRow, event: ToolStateEvent, now: Date): void {
  const forGood = event === 'mark_lost' || event === 'retire';
  const why = event === 'mark_lost' ? 'has been marked lost' : event === 'retire' ? 'has been retired from the crib' : 'has been taken out of service';
  const affected = holdsOnTool(ctx.db, tool.id, forGood ? ACTIVE_HOLD_STATUSES : ['offered']);
  const link = toolLink(ctx, tool.code);
  for (const { hold, name, email } of affected) {
    if (forGood) {
      closeHold(ctx.db, hold.id, 'cancelled', now);
      recordToolEvent(ctx.db, { toolId: tool.id, actorId: null, at: now, action: 'hold_cancelled', detail: `${name}'s hold ended: the tool ${why.replace('has been ', 'was ')}` });
    } else {
      withdrawOffer(ctx.db, hold.id);
      recordToolEvent(ctx.db, { toolId: tool.id, actorId: null, at: now, action: 'hold_offer_ended', detail: `${name} stays first in the queue` });
    }
    queueMail(ctx.db, holdEndedMail(email, name, tool, why, !forGood, link), now);
  }
}

/**
 * A person leaves the chapter (deactivated): every hold and queue place of theirs ends, and a tool
 * set aside for them goes to the next person or back on the shelf. Runs in the caller's transaction.
 */
export function endHoldsOfPerson(ctx: ServiceContext, userId: number, now: Date): void {
  for (const { hold, name } of activeHoldsOfPerson(ctx.db, userId)) {
    closeHold(ctx.db, hold.id, 'cancelled', now);
    recordToolEvent(ctx.db, { toolId: hold.toolId, actorId: null, at: now, action: 'hold_cancelled', detail: `${name} no longer belongs to the chapter` });
    if (hold.status === 'offered') releaseHeldTool(ctx, hold.toolId, now);
  }
}

