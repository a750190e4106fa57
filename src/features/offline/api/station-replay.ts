import type { StationReplaySignInBody } from '@shared/schemas/stations';
import { ANSWER_TIMEOUT_MS, ApiError, api, setCsrfToken } from '@/lib/api-client';
import type { QueuedAction } from '../db';
import { isRefusal, refusalOf } from '../utils/refusal';
import { markRefused, markSent } from './queue';
import { stationWaitingOf } from './station-queue';
import { sendQueued } from './send-queued';

export interface StationReplayResult {
  sent: number;
  refused: number;
  /** Entries were left waiting: no answer, a "not now", or a badge scanned meanwhile. */
  stopped: boolean;
  /** The server no longer knows this station: the screen forgets it. */
  notEnrolled: boolean;
}

const isApiCode = (err: unknown, code: string) => err instanceof ApiError && err.code === code;

/** Opens a replay session for the badge's holder; the server starts a new session, so the old CSRF token is dropped. */
async function replaySignIn(badge: string): Promise<void> {
  const body: StationReplaySignInBody = { badge };
  await api.post('/api/station/replay-sign-in', body, { timeoutMs: ANSWER_TIMEOUT_MS });
  setCsrfToken(undefined);
}

let stopAsked = false;

async function replay(stationId: number, endSession: () => Promise<void>, onSettled: (entry: QueuedAction) => void): Promise<StationReplayResult> {
  const result: StationReplayResult = { sent: 0, refused: 0, stopped: false, notEnrolled: false };
  /** Whose replay session is open now: an entry of another badge signs its own person in first. */
  let sessionBadge: string | undefined;
  let signedIn = false;

  /** What one failed request means: the entry refused (and on with the rest), or stop here and keep it. */
  const failed = async (entry: QueuedAction, err: unknown, refused: boolean): Promise<'next' | 'stop'> => {
    if (isApiCode(err, 'STATION_NOT_ENROLLED')) result.notEnrolled = true;
    else if (refused && err instanceof ApiError) {
      await markRefused(entry.seq, refusalOf(entry, err));
      result.refused++;
      onSettled(entry);
      return 'next';
    } else if (!(err instanceof ApiError)) throw err;
    result.stopped = true;
    return 'stop';
  };

  try {
    for (const entry of await stationWaitingOf(stationId)) {
      if (stopAsked) {
        result.stopped = true;
        break;
      }
      const badge = entry.station!.badge;
      if (badge !== sessionBadge) {
        sessionBadge = undefined;
        signedIn = true;
        try {
          await replaySignIn(badge);
          sessionBadge = badge;
        } catch (err) {
          // An unknown or revoked badge is the server's "no" to that entry, though a 401.
          if ((await failed(entry, err, isRefusal(err) || isApiCode(err, 'BADGE_NOT_RECOGNISED'))) === 'next') continue;
          break;
        }
      }
      try {
        await sendQueued(entry);
      } catch (err) {
        if ((await failed(entry, err, isRefusal(err))) === 'next') continue;
        break;
      }
      await markSent(entry.seq);
      result.sent++;
      onSettled(entry);
    }
  } finally {
    if (signedIn) await endSession();
  }
  return result;
}

let running: Promise<StationReplayResult> | undefined;

/**
 * Sends the station's waiting actions in the order they were done: before each person's run of
 * entries, a replay session for their badge (`POST /api/station/replay-sign-in`), then each entry
 * with its key and times as the phone sends it, and at the end the session is ended (`endSession`).
 * One replay runs at a time: a call while one runs gets that one's result.
 */
export function replayStationQueue(stationId: number, endSession: () => Promise<void>, onSettled: (entry: QueuedAction) => void = () => {}): Promise<StationReplayResult> {
  if (!running) stopAsked = false;
  running ??= replay(stationId, endSession, onSettled).finally(() => {
    running = undefined;
  });
  return running;
}

/** A badge was scanned: the replay stops after the entry it is sending, ends its session, and this resolves then. */
export async function stopStationReplay(): Promise<void> {
  if (!running) return;
  stopAsked = true;
  await running.catch(() => undefined);
}
