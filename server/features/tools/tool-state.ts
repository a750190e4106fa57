import { and, eq, sql } from 'drizzle-orm';
import { STATUS_LABELS, type ToolStatus } from '@shared/tools/categories';
import type { Database } from '../../db/client';
import { preparedPerDatabase } from '../../db/prepared';
import { toolEvents, tools } from '../../db/schema/tools';
import { HttpError } from '../../lib/http-error';

/**
 * The one writer of `tools.status`. Every change of a tool's state is an event in this table:
 * the states it may start from, a guard the caller's facts must pass, the state it leads to, and
 * the audit entry it records. `moveTool` writes the state and its audit entry together, inside the
 * caller's transaction, so the trail is written in the order things happen.
 */

export type ToolStateEvent =
  | 'check_out'
  | 'return'
  | 'return_needs_attention'
  | 'offer'
  | 'pass_offer'
  | 'offer_ended'
  | 'take_out_of_service'
  | 'back_in_service'
  | 'mark_lost'
  | 'found'
  | 'retire';

/** What the caller knows that a guard may need. */
export interface GuardFacts {
  /** The tool is held, and the offer is for the person acting. */
  offeredToActor?: boolean;
}

export interface ToolTransition {
  from: readonly ToolStatus[];
  /** A refusal in words when the facts do not allow the move, or null. */
  guard?: (facts: GuardFacts, from: ToolStatus) => string | null;
  to: ToolStatus;
  /** The audit entry's action. */
  action: string;
  /** The event in words, for "… so it cannot be <words> now". */
  words: string;
  /** Whether the note given is kept as the tool's status note (why it is out of use). */
  keepsNote: boolean;
}

export const TOOL_TRANSITIONS: Readonly<Record<ToolStateEvent, ToolTransition>> = {
  check_out: {
    from: ['available', 'held'],
    guard: (f, from) => (from === 'held' && !f.offeredToActor ? 'it is set aside for someone else' : null),
    to: 'on_loan',
    action: 'checked_out',
    words: 'checked out',
    keepsNote: false,
  },
  return: { from: ['on_loan'], to: 'available', action: 'returned', words: 'returned', keepsNote: false },
  return_needs_attention: { from: ['on_loan'], to: 'out_of_service', action: 'returned', words: 'returned', keepsNote: true },
  offer: { from: ['available'], to: 'held', action: 'held', words: 'set aside', keepsNote: false },
  pass_offer: { from: ['held'], to: 'held', action: 'held', words: 'passed to the next person', keepsNote: false },
  offer_ended: { from: ['held'], to: 'available', action: 'hold_released', words: 'put back on the shelf', keepsNote: false },
  take_out_of_service: { from: ['available', 'held'], to: 'out_of_service', action: 'out_of_service', words: 'taken out of service', keepsNote: true },
  back_in_service: { from: ['out_of_service'], to: 'available', action: 'back_in_service', words: 'put back in service', keepsNote: false },
  mark_lost: { from: ['available', 'on_loan', 'held', 'out_of_service'], to: 'lost', action: 'lost', words: 'marked lost', keepsNote: true },
  found: { from: ['lost'], to: 'available', action: 'found', words: 'marked found', keepsNote: false },
  retire: { from: ['available', 'held', 'out_of_service', 'lost'], to: 'retired', action: 'retired', words: 'retired', keepsNote: true },
};

export interface ToolInState {
  id: number;
  code: string;
  status: ToolStatus;
}

export interface ToolMove {
  actorId: number | null;
  /** The crib station the person acted at, if any. */
  stationId?: number | null;
  /** When it happened (a queued offline action: when it was done). */
  at: Date;
  /** When it is recorded; the tool's updatedAt. Defaults to `at`. */
  now?: Date;
  /** The audit entry's detail, and the status note when the new state keeps one. */
  detail: string;
  /** The status note, when the new state keeps one; defaults to the detail. */
  note?: string;
  facts?: GuardFacts;
}

const p = sql.placeholder;

const statements = preparedPerDatabase((db: Database) => ({
  /** Compare and set: the write happens only from the state the move was checked against. */
  setStatus: db
    .update(tools)
    .set({ status: sql`${p('to')}`, statusNote: sql`${p('note')}`, updatedAt: sql`${p('updatedAt')}` })
    .where(and(eq(tools.id, p('toolId')), eq(tools.status, sql`${p('from')}`)))
    .prepare(),
  insertEvent: db
    .insert(toolEvents)
    .values({ toolId: p('toolId'), actorId: p('actorId'), stationId: p('stationId'), at: p('at'), action: p('action'), fromStatus: p('fromStatus'), toStatus: p('toStatus'), detail: p('detail') })
    .prepare(),
}));

/** Why a move is refused in words, or null when the table allows it. */
export function refusalOf(tool: ToolInState, event: ToolStateEvent, facts: GuardFacts = {}): string | null {
  const rule = TOOL_TRANSITIONS[event];
  if (!rule.from.includes(tool.status)) return `${tool.code} is ${STATUS_LABELS[tool.status].toLowerCase()}, so it cannot be ${rule.words} now.`;
  const guard = rule.guard?.(facts, tool.status);
  return guard ? `${tool.code} cannot be ${rule.words} now: ${guard}.` : null;
}

export const canMove = (tool: ToolInState, event: ToolStateEvent, facts: GuardFacts = {}): boolean => refusalOf(tool, event, facts) === null;

/**
 * Moves a tool by one event of the table and records it; returns the tool in its new state.
 * A move the table does not allow is 409 WRONG_STATE with the reason in words, and writes nothing.
 */
export function moveTool(db: Database, tool: ToolInState, event: ToolStateEvent, move: ToolMove): ToolInState {
  const refusal = refusalOf(tool, event, move.facts);
  if (refusal) throw new HttpError(409, 'WRONG_STATE', refusal);
  const rule = TOOL_TRANSITIONS[event];
  const s = statements(db);
  const changed = s.setStatus.run({
    toolId: tool.id,
    from: tool.status,
    to: rule.to,
    note: rule.keepsNote ? (move.note ?? move.detail) : null,
    updatedAt: (move.now ?? move.at).getTime(),
  });
  if (changed.changes !== 1) throw new HttpError(409, 'WRONG_STATE', `${tool.code} changed meanwhile; look again and retry.`);
  s.insertEvent.run({ toolId: tool.id, actorId: move.actorId, stationId: move.stationId ?? null, at: move.at, action: rule.action, fromStatus: tool.status, toStatus: rule.to, detail: move.detail });
  return { ...tool, status: rule.to };
}
