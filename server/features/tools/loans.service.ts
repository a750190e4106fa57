import type { CheckoutBody, ReturnBody } from '@shared/schemas/tools';
import { hasRole } from '@shared/roles';
import { dayInWords, loanDueAt } from '@shared/time/chapter-time';
import { DAY_MS } from '@shared/time/durations';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { isUniqueViolation } from '../../lib/sqlite-errors';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { offerToNextInQueue } from './holds.service';
import { loanStatements } from './loans.repo';
import { checkReturnPhoto } from './photos.service';
import { signOffAdvice } from './signoffs.service';
import { effectiveLoanDays } from './tool-dto';
import type { ToolRow } from './tools.repo';

const MAX_LOAN_MS = 365 * DAY_MS;

export interface LoanResult {
  id: number;
  toolId: number;
  code: string;
  holder: { id: number; name: string };
  checkedOutAt: string;
  dueAt: string;
  /** When the checkout reached the server (checkedOutAt is when it was done). */
  recordedAt: string;
  accessories: string[];
}

function toolOrThrow(ctx: ServiceContext, code: string): ToolRow {
  const tool = loanStatements(ctx.db).toolByCode.get({ code });
  if (!tool) throw new HttpError(404, 'TOOL_NOT_FOUND', `No tool has the code ${code}. Check the label, or type the code.`);
  return tool;
}

function dueDate(tool: ToolRow, body: CheckoutBody, now: Date, zone: string): Date {
  if (!body.dueAt) return loanDueAt(now, effectiveLoanDays(tool), zone);
  const due = new Date(body.dueAt);
  if (due.getTime() <= now.getTime()) throw new HttpError(400, 'DUE_DATE_PAST', 'The due date must be in the future.');
  if (due.getTime() - now.getTime() > MAX_LOAN_MS) throw new HttpError(400, 'DUE_DATE_TOO_FAR', 'A loan lasts at most a year.');
  return due;
}

/**
 * Checks a tool out to the signed-in person. Only an available tool, or one held for this person,
 * can go out; a required sign-off must be on record. The partial unique index on open loans is
 * the last word when two phones race. `performedAt` is when the member took it (earlier than now
 * for a checkout queued offline): the loan and its due date count from it.
 */
export function checkOut(ctx: ServiceContext, user: UserRow, code: string, body: CheckoutBody, performedAt?: Date): LoanResult {
  const s = loanStatements(ctx.db);
  const now = ctx.now();
  const at = performedAt ?? now;
  const zone = readChapterTimeZone(ctx.db);
  const dateWords = (d: Date) => dayInWords(d, zone, now);
  return ctx.db.$client.transaction(() => {
    const tool = toolOrThrow(ctx, code);
    if (tool.status === 'on_loan') {
      const loan = s.openLoan.get({ toolId: tool.id });
      const who = loan ? (loan.userId === user.id ? 'you' : loan.holderName) : 'someone';
      throw new HttpError(409, 'TOOL_ON_LOAN', `${tool.code} is on loan: held by ${who} until ${loan ? dateWords(loan.dueAt) : 'its return'}.`);
    }
    let holdId: number | undefined;
    if (tool.status === 'held') {
      const offer = s.offeredHold.get({ toolId: tool.id });
      if (offer && offer.userId !== user.id) {
        throw new HttpError(409, 'TOOL_HELD', `${tool.code} is held for ${offer.name} until ${offer.offerExpiresAt?.toISOString().slice(0, 16).replace('T', ' ') ?? 'they collect it'}.`);
      }
      holdId = offer?.id;
    } else if (tool.status === 'out_of_service') {
      throw new HttpError(403, 'TOOL_OUT_OF_SERVICE', `${tool.code} is out of service${tool.statusNote ? `: ${tool.statusNote}` : ''}. Ask the quartermaster.`);
    } else if (tool.status !== 'available') {
      throw new HttpError(403, 'TOOL_UNAVAILABLE', `${tool.code} is ${tool.status === 'lost' ? 'marked lost' : 'retired'} and cannot be checked out.`);
    }
    if (tool.requiredSignoffId !== null && !s.hasSignoff.get({ signoffId: tool.requiredSignoffId, userId: user.id })) {
      const name = s.signoffName.get({ id: tool.requiredSignoffId })?.name ?? 'a sign-off';
      throw new HttpError(
        403,
        'SIGNOFF_REQUIRED',
        `${tool.code} needs the "${name}" sign-off, which you do not have yet. ${signOffAdvice(ctx.db)}`,
      );
    }
    const due = dueDate(tool, body, at, zone);
    let loanId: number;
    try {
      loanId = s.insertLoan.get({ toolId: tool.id, userId: user.id, checkedOutAt: at, dueAt: due, arrivedAt: now }).id;
    } catch (err) {
      if (isUniqueViolation(err)) {
        throw new HttpError(409, 'TOOL_ON_LOAN', `${tool.code} was just checked out by someone else.`);
      }
      throw err;
    }
    s.setToolStatus.run({ toolId: tool.id, status: 'on_loan', statusNote: null, updatedAt: now.getTime() });
    if (holdId !== undefined) s.fulfilHold.run({ holdId, at: at.getTime() });
    s.insertEvent.run({
      toolId: tool.id,
      actorId: user.id,
      at,
      action: 'checked_out',
      fromStatus: tool.status,
      toStatus: 'on_loan',
      detail: `Due ${dateWords(due)}`,
    });
    return {
      id: loanId,
      toolId: tool.id,
      code: tool.code,
      holder: { id: user.id, name: user.name },
      checkedOutAt: at.toISOString(),
      dueAt: due.toISOString(),
      recordedAt: now.toISOString(),
      accessories: JSON.parse(tool.accessories) as string[],
    };
  })();
}

export interface ReturnResult {
  loanId: number;
  code: string;
  status: ToolRow['status'];
  shortfall: number | null;
  offeredTo: { id: number; name: string } | null;
  /** When it came back (a return queued offline: when it was done, never before the checkout). */
  returnedAt: string;
  /** When the return reached the server. */
  recordedAt: string;
}

/** Returns a tool: the holder, or a quartermaster or lead on their behalf. */
export async function returnTool(ctx: ServiceContext, user: UserRow, code: string, body: ReturnBody): Promise<ReturnResult> {
  const { result, notify } = returnToolNow(ctx, user, code, body);
  await notify?.();
  return result;
}

/**
 * The return's transaction, with the hold offer's e-mail to send once it has committed.
 * `performedAt` (a return queued offline) is kept, but never before the loan began.
 */
export function returnToolNow(
  ctx: ServiceContext,
  user: UserRow,
  code: string,
  body: ReturnBody,
  performedAt?: Date,
): { result: ReturnResult; notify?: () => Promise<void> } {
  const s = loanStatements(ctx.db);
  const now = ctx.now();
  return ctx.db.$client.transaction(() => {
    const tool = toolOrThrow(ctx, code);
    const loan = s.openLoan.get({ toolId: tool.id });
    if (!loan) throw new HttpError(409, 'TOOL_NOT_ON_LOAN', `${tool.code} is not on loan, so there is nothing to return.`);
    if (loan.userId !== user.id && !hasRole(user.role, 'quartermaster')) {
      throw new HttpError(403, 'NOT_YOUR_LOAN', `${tool.code} is on loan to ${loan.holderName}; only they or the quartermaster can return it.`);
    }
    let shortfall: number | null = null;
    if (tool.category === 'temporary_fastener_tray') {
      if (body.returnedCount === undefined) {
        throw new HttpError(400, 'COUNT_REQUIRED', `Count the temporary fasteners in the tray: a full tray holds ${tool.trayCapacity ?? '?'}.`, [
          { path: 'returnedCount', message: 'Count the fasteners that came back.' },
        ]);
      }
      if (tool.trayCapacity !== null && body.returnedCount > tool.trayCapacity) {
        throw new HttpError(400, 'COUNT_TOO_HIGH', `A full tray holds ${tool.trayCapacity}; ${body.returnedCount} is more than that. Count again.`, [
          { path: 'returnedCount', message: `At most ${tool.trayCapacity}.` },
        ]);
      }
      shortfall = tool.trayCapacity !== null ? tool.trayCapacity - body.returnedCount : null;
    }
    if (body.photoId !== undefined) checkReturnPhoto(ctx, tool, body.photoId);
    const at = performedAt && performedAt < loan.checkedOutAt ? loan.checkedOutAt : (performedAt ?? now);
    s.closeLoan.run({
      loanId: loan.id,
      returnedAt: at.getTime(),
      arrivedAt: now.getTime(),
      returnedById: user.id,
      condition: body.condition,
      note: body.note ?? null,
      returnedCount: body.returnedCount ?? null,
      shortfall,
      returnPhotoId: body.photoId ?? null,
    });
    const detail = [
      body.condition === 'ok' ? 'Came back ok' : `Needs attention: ${body.note}`,
      shortfall ? `${shortfall} temporary fasteners short` : '',
      loan.userId !== user.id ? `returned for ${loan.holderName}` : '',
    ]
      .filter(Boolean)
      .join('; ');
    let status: ToolRow['status'];
    let offeredTo: ReturnResult['offeredTo'] = null;
    let notify: (() => Promise<void>) | undefined;
    if (body.condition === 'needs_attention') {
      status = 'out_of_service';
      s.setToolStatus.run({ toolId: tool.id, status, statusNote: body.note ?? 'Needs attention', updatedAt: now.getTime() });
    } else {
      const offer = s.anyoneWaiting.get({ toolId: tool.id }) ? offerToNextInQueue(ctx, tool, now) : undefined;
      status = offer ? 'held' : 'available';
      offeredTo = offer ? { id: offer.userId, name: offer.name } : null;
      notify = offer?.notify;
      if (!offer) s.setToolStatus.run({ toolId: tool.id, status, statusNote: null, updatedAt: now.getTime() });
    }
    s.insertEvent.run({ toolId: tool.id, actorId: user.id, at, action: 'returned', fromStatus: 'on_loan', toStatus: status, detail });
    const result = { loanId: loan.id, code: tool.code, status, shortfall, offeredTo, returnedAt: at.toISOString(), recordedAt: now.toISOString() };
    return { result, notify };
  })();
}
