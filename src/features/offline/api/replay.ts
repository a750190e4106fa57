import { ApiError, api, isNoConnection, sessionGeneration } from '@/lib/api-client';
import type { MeResponse } from '@shared/schemas/auth';
import type { QueuedAction } from '../db';
import { isRefusal, refusalOf } from '../utils/refusal';
import { markRefused, markSent, nextWaiting } from './queue';
import { sendQueued } from './send-queued';

export interface ReplayResult {
  sent: QueuedAction[];
  refused: QueuedAction[];
  /** True when entries were left waiting: no answer, or the session is not this member's. */
  stopped: boolean;
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
      await markRefused(entry.seq, refusalOf(entry, err));
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
