import type { askSignoffBodySchema, SignoffRequest } from '@shared/schemas/signoff-requests';
import type { z } from 'zod';
import type { ServiceContext } from '../../context';
import type { Executor } from '../../db/client';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { isUniqueViolation } from '../../lib/sqlite-errors';
import { signoffAnswerMail } from '../../mail/messages';
import { queueMail } from '../../mail/outbox';
import {
  closeSignoffRequest,
  findOpenSignoffRequest,
  findSignoffRequest,
  insertSignoffRequest,
  listSignoffRequests,
  type SignoffRequestWithNames,
} from './signoff-requests.repo';
import { findActiveGrant, findSignoff } from './signoffs.repo';
import { findToolByCode } from './tools.repo';

type AskInput = z.output<typeof askSignoffBodySchema>;

function requestDto(r: SignoffRequestWithNames): SignoffRequest {
  return {
    id: r.request.id,
    signoff: r.signoff,
    member: { id: r.member.id, name: r.member.name },
    tool: r.tool,
    note: r.request.note,
    state: r.request.state,
    askedAt: r.request.askedAt.toISOString(),
    closedAt: r.request.closedAt?.toISOString() ?? null,
    declineReason: r.request.declineReason,
  };
}

const alreadyAsked = (r: SignoffRequestWithNames) =>
  new HttpError(409, 'SIGNOFF_REQUEST_OPEN', `You already asked for the "${r.signoff.name}" sign-off (from ${r.tool.code}); a chapter lead will answer it.`);

/** A member asks for the sign-off a tool needs, from the tool's page. One open request per person and sign-off. */
export function askForSignoff(ctx: ServiceContext, member: UserRow, body: AskInput): SignoffRequest {
  const tool = findToolByCode(ctx.db, body.toolCode);
  if (!tool) throw new HttpError(404, 'TOOL_NOT_FOUND', `No tool has the code ${body.toolCode}.`);
  if (tool.requiredSignoffId === null) throw new HttpError(409, 'NO_SIGNOFF_NEEDED', `${tool.code} needs no sign-off; anyone may check it out.`);
  const signoffId = tool.requiredSignoffId;
  const id = ctx.db.transaction((db) => {
    const signoff = findSignoff(db, signoffId)!;
    if (findActiveGrant(db, signoffId, member.id)) {
      throw new HttpError(409, 'ALREADY_SIGNED_OFF', `You already hold the "${signoff.name}" sign-off, so ${tool.code} is yours to use.`);
    }
    const open = findOpenSignoffRequest(db, signoffId, member.id);
    if (open) throw alreadyAsked(open);
    try {
      return insertSignoffRequest(db, { signoffId, userId: member.id, toolId: tool.id, note: body.note, askedAt: ctx.now() }).id;
    } catch (err) {
      if (isUniqueViolation(err)) throw alreadyAsked(findOpenSignoffRequest(db, signoffId, member.id)!);
      throw err;
    }
  });
  return requestDto(findSignoffRequest(ctx.db, id)!);
}

/** Requests waiting for a lead, the oldest first (people deactivated meanwhile left out). */
export const openSignoffRequests = (ctx: ServiceContext): SignoffRequest[] => listSignoffRequests(ctx.db, { state: 'open' }).map(requestDto);

/** A member's own requests, the newest first, answered ones included. */
export const mySignoffRequests = (ctx: ServiceContext, member: UserRow): SignoffRequest[] => listSignoffRequests(ctx.db, { userId: member.id }).map(requestDto);

function tellMember(ctx: ServiceContext, db: Executor, r: SignoffRequestWithNames, lead: UserRow, declineReason: string | null, now: Date): void {
  const answer = { to: r.member.email, name: r.member.name, signoff: r.signoff.name, tool: r.tool, lead: lead.name, declineReason };
  queueMail(db, signoffAnswerMail(answer, ctx.publicUrl), now);
}

/**
 * Called by the grant, inside its transaction: the person's open request for that sign-off (if
 * any) closes as granted, and they are told, so the grant and the answer commit together.
 */
export function closeRequestOnGrant(ctx: ServiceContext, db: Executor, signoffId: number, userId: number, lead: UserRow, now: Date): void {
  const open = findOpenSignoffRequest(db, signoffId, userId);
  if (!open || !closeSignoffRequest(db, open.request.id, { state: 'granted', at: now, byId: lead.id })) return;
  tellMember(ctx, db, open, lead, null, now);
}

/** The lead says no, with the reason the member reads in the mail. */
export function declineSignoffRequest(ctx: ServiceContext, lead: UserRow, id: number, reason: string): SignoffRequest {
  const now = ctx.now();
  ctx.db.transaction((db) => {
    const found = findSignoffRequest(db, id);
    if (!found) throw new HttpError(404, 'SIGNOFF_REQUEST_NOT_FOUND', `No sign-off request has id ${id}. Reload the list of requests.`);
    if (!closeSignoffRequest(db, id, { state: 'declined', at: now, byId: lead.id, declineReason: reason })) {
      throw new HttpError(409, 'SIGNOFF_REQUEST_CLOSED', `${found.member.name}'s request for "${found.signoff.name}" has already been answered.`);
    }
    tellMember(ctx, db, found, lead, reason, now);
  });
  return requestDto(findSignoffRequest(ctx.db, id)!);
}
