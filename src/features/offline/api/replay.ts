import { ApiError, api, isNoConnection, sessionGeneration } from '@/lib/api-client';
import type { MeResponse } from '@shared/schemas/auth';
import type { QueuedAction } from '../db';
import { nextStepFor } from '../utils/next-step';
import { markRefused, markSent, nextWaiting } from './queue';
import { sendQueued } from './send-queued';

export interface ReplayResult {
  sent: QueuedAction[];
  refused: QueuedAction[];
  /** True when entries were left waiting: no answer, or the session is not this member's. */
  stopped: boolean;
}

/** Answers that say "not now" rather than "no": a lapsed session, a stale token, the same key still being handled. */
const TRY_AGAIN_STATUSES = [401, 408, 429];
const TRY_AGAIN_CODES = ['CSRF_TOKEN_INVALID', 'IDEMPOTENCY_KEY_IN_USE'];

/**
 * A refusal is the server's final word on that action: it goes to the Not sent list. No answer, a
 * server hiccup or a "not now" says nothing about the action: keep it and stop, so nothing after it
 * goes ahead of it.
 */
function isRefusal(err: unknown): err is ApiError {
  return err instanceof ApiError && err.status >= 400 && err.status < 500 && !TRY_AGAIN_STATUSES.includes(err.status) && !TRY_AGAIN_CODES.includes(err.code);
}

/** The server applies an action to whoever the session belongs to: send only when that is this member. */
async function sessionIsMember(memberId: number): Promise<boolean> {
  try {
    const { user } = await api.getOrGiveUp<MeResponse>('/api/auth/me');
    return user?.id === memberId;
  } catch (err) {
    if (err instanceof ApiError) return false;
    throw err;
  }
}

async function replay(memberId: number, onSettled: (entry: QueuedAction) => void): Promise<ReplayResult> {
  const result: ReplayResult = { sent: [], refused: [], stopped: false };
  let entry = await nextWaiting(memberId);
  const session = sessionGeneration();
  if (entry && !(await sessionIsMember(memberId))) return { ...result, stopped: true };
  for (; entry; entry = await nextWaiting(memberId)) {
    // Someone signed in or out meanwhile: the next send would go out under another session.
    if (sessionGeneration() !== session) return { ...result, stopped: true };
    try {
      await sendQueued(entry);
    } catch (err) {
      if (!isRefusal(err)) {
        if (!isNoConnection(err) && !(err instanceof ApiError)) throw err;
        result.stopped = true;
        return result;
      }
      await markRefused(entry.seq, {
        status: err.status,
        code: err.code,
        message: err.message,
        nextStep: nextStepFor(entry.kind, err.code),
        at: new Date().toISOString(),
      });
      result.refused.push(entry);
      onSettled(entry);
      continue;
    }
    await markSent(entry.seq);
    result.sent.push(entry);
    onSettled(entry);
  }
  return result;
}

let running: Promise<ReplayResult> | undefined;

/**
 * Sends the member's waiting actions in the order they were done, one at a time, each with its
 * idempotency key (so a send whose answer was lost is harmless to repeat). One replay runs at a
 * time: a call while one runs gets that one's result.
 */
export function replayQueue(memberId: number, onSettled: (entry: QueuedAction) => void = () => {}): Promise<ReplayResult> {
  running ??= replay(memberId, onSettled).finally(() => {
    running = undefined;
  });
  return running;
}
