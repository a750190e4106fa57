import type { CheckoutBody, Loan, ReturnBody } from '@shared/schemas/tools';
import { actedBy } from './tool-events.repo';
import { hasRole } from '@shared/roles';
import { dayInWords, loanDueAt } from '@shared/time/chapter-time';
import { DAY_MS } from '@shared/time/durations';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { isUniqueViolation } from '../../lib/sqlite-errors';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { offerToNextInQueue } from './holds.service';
import { listLoans } from './loan-history.repo';
import { loanStatements } from './loans.repo';
import { accessoryList, recordMissingAccessories } from './missing-accessories';
import { checkReturnPhoto } from './photos.service';
import { refuseWithoutSignoff } from './signoffs.service';
import { effectiveLoanDays } from './tool-dto';
import { moveTool } from './tool-state';
import { heldWords, loanWords } from '@shared/tools/tool-words';
import type { ToolRow } from './tools.repo';

const MAX_LOAN_MS = 365 * DAY_MS;

/** Loans with their tool and holder (one person's, or everyone's), open ones soonest due first, then history. */
export function listLoanHistory(ctx: ServiceContext, filter: { userId?: number; open?: boolean }): Loan[] {
  return listLoans(ctx.db, filter);
}

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
  return ctx.db.$client.transaction(() => {
    const tool = toolOrThrow(ctx, code);
    if (tool.status === 'on_loan') {
      const loan = s.openLoan.get({ toolId: tool.id });
      const who = loan ? loanWords({ name: loan.holderName, you: loan.userId === user.id }, loan.dueAt, now, zone) : '';
      throw new HttpError(409, 'TOOL_ON_LOAN', `${tool.code} is on loan. ${who}`.trim());
    }
    let holdId: number | undefined;
    if (tool.status === 'held') {
      const offer = s.offeredHold.get({ toolId: tool.id });
      if (offer && offer.userId !== user.id) {
        throw new HttpError(409, 'TOOL_HELD', `${tool.code} is not free. ${heldWords(offer.name, offer.offerExpiresAt, zone)}`);
      }
      holdId = offer?.id;
    } else if (tool.status === 'out_of_service') {
      throw new HttpError(403, 'TOOL_OUT_OF_SERVICE', `${tool.code} is out of service${tool.statusNote ? `: ${tool.statusNote}` : ''}. Ask the quartermaster.`);
    } else if (tool.status !== 'available') {
      throw new HttpError(403, 'TOOL_UNAVAILABLE', `${tool.code} is ${tool.status === 'lost' ? 'marked lost' : 'retired'} and cannot be checked out.`);
    }
    refuseWithoutSignoff(ctx, tool, user);
    const due = dueDate(tool, body, at, zone);
    const taken = accessoriesTaken(ctx, tool, body.accessories);
    let loanId: number;
    try {
      loanId = s.insertLoan.get({ toolId: tool.id, userId: user.id, checkedOutAt: at, dueAt: due, arrivedAt: now, accessoriesOut: taken ? JSON.stringify(taken) : null }).id;
    } catch (err) {
      if (isUniqueViolation(err)) {
        throw new HttpError(409, 'TOOL_ON_LOAN', `${tool.code} was just checked out by someone else.`);
      }
      throw err;
    }
    moveTool(ctx.db, tool, 'check_out', {
      ...actedBy(ctx, user),
      at,
      now,
      detail: `Due ${dayInWords(due, zone, at)}`,
      facts: { offeredToActor: holdId !== undefined },
    });
    if (holdId !== undefined) s.fulfilHold.run({ holdId, at: at.getTime() });
    return {
      id: loanId,
      toolId: tool.id,
      code: tool.code,
      holder: { id: user.id, name: user.name },
      checkedOutAt: at.toISOString(),
      dueAt: due.toISOString(),
      recordedAt: now.toISOString(),
      accessories: taken ?? [],
    };
  })();
}

/**
 * The accessories ticked at checkout, checked against the tool's list (less any still missing):
 * the loan records exactly what went out. Undefined when the checkout did not say.
 */
function accessoriesTaken(ctx: ServiceContext, tool: ToolRow, ticked: string[] | undefined): string[] | undefined {
  if (ticked === undefined) return undefined;
  const own = JSON.parse(tool.accessories) as string[];
  const missing = new Set(loanStatements(ctx.db).openMissing.all({ toolId: tool.id }).map((m) => m.accessory));
  const issues = ticked.flatMap((a, i) => {
    if (!own.includes(a)) return [{ path: `accessories.${i}`, message: `${tool.code} has no accessory called "${a}". It has: ${own.join(', ') || 'none'}.` }];
    if (missing.has(a)) return [{ path: `accessories.${i}`, message: `${a} is missing from ${tool.code}; the quartermaster has not marked it found yet.` }];
    if (ticked.indexOf(a) !== i) return [{ path: `accessories.${i}`, message: `${a} is listed twice.` }];
    return [];
  });
  if (issues.length > 0) throw new HttpError(400, 'UNKNOWN_ACCESSORY', issues.map((i) => i.message).join(' '), issues);
  return own.filter((a) => ticked.includes(a));
}

/** Of what went out with the loan, what did not come back; refuses a return that does not say, or names something that never went out. */
function accessoriesNotBack(tool: ToolRow, out: string[] | null, back: string[] | undefined): string[] {
  if (out === null || out.length === 0) {
    if (back && back.length > 0) throw new HttpError(400, 'UNKNOWN_ACCESSORY', `Nothing was recorded going out with ${tool.code}, so nothing can be ticked back.`, [{ path: 'accessoriesBack', message: 'Leave it out.' }]);
    return [];
  }
  if (back === undefined) {
    throw new HttpError(400, 'ACCESSORIES_UNCHECKED', `Tick what came back with ${tool.code}: ${out.join(', ')} went out with it.`, [
      { path: 'accessoriesBack', message: `Tick each of ${out.join(', ')} that came back.` },
    ]);
  }
  const strays = back.filter((a) => !out.includes(a));
  if (strays.length > 0) {
    throw new HttpError(400, 'UNKNOWN_ACCESSORY', `${strays.join(', ')} did not go out with this loan of ${tool.code}; it took ${out.join(', ')}.`, [{ path: 'accessoriesBack', message: 'Tick only what went out.' }]);
  }
  return out.filter((a) => !back.includes(a));
}

export interface ReturnResult {
  loanId: number;
  code: string;
  status: ToolRow['status'];
  shortfall: number | null;
  /** What went out with the loan and did not come back. */
  accessoriesMissing: string[];
  offeredTo: { id: number; name: string } | null;
  /** When it came back (a return queued offline: when it was done, never before the checkout). */
  returnedAt: string;
  /** When the return reached the server. */
  recordedAt: string;
}

/**
 * Returns a tool: the holder, or a quartermaster or lead on their behalf. When someone waits, the
 * offer and its e-mail (in the outbox) are written in the return's transaction.
 * `performedAt` (a return queued offline) is kept, but never before the loan began.
 */
export function returnTool(ctx: ServiceContext, user: UserRow, code: string, body: ReturnBody, performedAt?: Date): ReturnResult {
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
    const notBack = accessoriesNotBack(tool, accessoryList(loan.accessoriesOut), body.accessoriesBack);
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
      notBack.length > 0 ? `did not come back: ${notBack.join(', ')}` : '',
      loan.userId !== user.id ? `returned for ${loan.holderName}` : '',
    ]
      .filter(Boolean)
      .join('; ');
    recordMissingAccessories(ctx.db, { toolId: tool.id, loanId: loan.id, accessories: notBack, at });
    let status: ToolRow['status'];
    let offeredTo: ReturnResult['offeredTo'] = null;
    if (body.condition === 'needs_attention') {
      status = moveTool(ctx.db, tool, 'return_needs_attention', { ...actedBy(ctx, user), at, now, detail, note: body.note ?? 'Needs attention' }).status;
    } else {
      const back = moveTool(ctx.db, tool, 'return', { ...actedBy(ctx, user), at, now, detail });
      const offer = s.anyoneWaiting.get({ toolId: tool.id }) ? offerToNextInQueue(ctx, { ...tool, status: back.status }, now) : undefined;
      status = offer ? 'held' : back.status;
      offeredTo = offer ? { id: offer.userId, name: offer.name } : null;
    }
    return { loanId: loan.id, code: tool.code, status, shortfall, accessoriesMissing: notBack, offeredTo, returnedAt: at.toISOString(), recordedAt: now.toISOString() };
  })();
}
