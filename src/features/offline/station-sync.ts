import { useCallback, useEffect, useRef } from 'react';
import type { StationCopy } from '@shared/schemas/stations';
import { ApiError, onReachability } from '@/lib/api-client';
import { forgetStationCopy, refreshStationCopy } from './api/station-copy';
import { replayStationQueue } from './api/station-replay';
import { isOffline } from './connection';
import type { QueuedAction, StoredStationCopy } from './db';
import { useStationCopy } from './hooks';

const REFRESH_EVERY_MS = 5 * 60_000;
/** How often to ask again while the network is up but the server did not answer. */
const PROBE_EVERY_MS = 15_000;

interface StationSyncOptions {
  stationId: number;
  /** Nobody is signed in at the station (the badge screen): the queue may be sent. */
  mayReplay: boolean;
  /** No person's live server session: a request for the copy would not run under it. */
  mayTakeCopy: boolean;
  /** The server no longer knows the station (401 STATION_NOT_ENROLLED): its copy is already deleted. */
  onNotEnrolled: () => void;
  /** Ends the replay's station session. */
  endSession: () => Promise<void>;
  onSettled?: (entry: QueuedAction) => void;
}

/**
 * Keeps the station's copy and sends what was queued at it: when the station opens, every 5 minutes,
 * when the connection comes back and whenever `sync` is called (after each session ends). Each sync
 * takes a fresh copy, then sends the waiting actions if nobody is signed in.
 */
export function useStationSync(options: StationSyncOptions): {
  copy: StoredStationCopy | null | undefined;
  takeCopy: () => Promise<StationCopy | undefined>;
  sync: () => Promise<void>;
} {
  const { stationId } = options;
  const copy = useStationCopy(stationId);
  const latest = useRef(options);
  useEffect(() => {
    latest.current = options;
  });

  const notEnrolled = useCallback(async () => {
    await forgetStationCopy(stationId);
    latest.current.onNotEnrolled();
  }, [stationId]);

  const takeCopy = useCallback(async (): Promise<StationCopy | undefined> => {
    if (!navigator.onLine || !latest.current.mayTakeCopy) return undefined;
    try {
      return await refreshStationCopy(stationId);
    } catch (err) {
      if (err instanceof ApiError && err.code === 'STATION_NOT_ENROLLED') await notEnrolled();
      return undefined;
    }
  }, [stationId, notEnrolled]);

  const syncing = useRef(false);
  const sync = useCallback(async () => {
    if (syncing.current) return;
    syncing.current = true;
    try {
      await takeCopy();
      if (!latest.current.mayReplay || isOffline()) return;
      const result = await replayStationQueue(stationId, () => latest.current.endSession(), (entry) => latest.current.onSettled?.(entry)).catch(() => undefined);
      if (result?.notEnrolled) await notEnrolled();
    } finally {
      syncing.current = false;
    }
  }, [stationId, takeCopy, notEnrolled]);

  useEffect(() => {
    void sync();
    const every = setInterval(() => void sync(), REFRESH_EVERY_MS);
    const probe = setInterval(() => {
      if (navigator.onLine && isOffline()) void sync();
    }, PROBE_EVERY_MS);
    const onOnline = () => void sync();
    let answered = !isOffline();
    const stopListening = onReachability((now) => {
      if (now && !answered) void sync();
      answered = now;
    });
    window.addEventListener('online', onOnline);
    return () => {
      clearInterval(every);
      clearInterval(probe);
      stopListening();
      window.removeEventListener('online', onOnline);
    };
  }, [sync]);

  return { copy, takeCopy, sync };
}
