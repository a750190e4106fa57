import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import { onReachability } from '@/lib/api-client';
import { forgetOtherCatalogues, refreshCatalogue } from '../api/catalogue';
import { replayQueue } from '../api/replay';
import { isOffline, useOffline } from '../connection';
import type { QueuedAction } from '../db';
import { useWaiting } from '../hooks';

const REFRESH_EVERY_MS = 5 * 60_000;
const RETRY_FIRST_MS = 5_000;
const RETRY_MOST_MS = 2 * 60_000;
/** How often to ask again while the network is up but the server did not answer. */
const PROBE_EVERY_MS = 15_000;

/**
 * Keeps the signed-in member's offline copy fresh and sends their queue when the connection is
 * back: at start, on the `online` event, when a request gets an answer after none did, after a
 * successful change, every few minutes while the page is visible, and with backoff after a failure.
 * While the network is up but the server is silent, it asks again every few seconds.
 * `onSettled` hears of each entry sent or refused, to refresh what it changed; `prepare` fetches
 * what the pages a scan opens need, before the first copy is taken.
 */
export function OfflineSync({
  memberId,
  onSettled,
  prepare,
}: {
  memberId: number;
  onSettled: (entry: QueuedAction) => void;
  prepare?: () => Promise<void>;
}) {
  const queryClient = useQueryClient();
  const settled = useRef(onSettled);
  const prepared = useRef(prepare);
  const sendNow = useRef<() => Promise<void>>(undefined);
  const waiting = useWaiting(memberId)?.length ?? 0;
  const offline = useOffline();

  useEffect(() => {
    settled.current = onSettled;
  });

  useEffect(() => {
    let active = true;
    let retryTimer: ReturnType<typeof setTimeout> | undefined;
    let refreshTimer: ReturnType<typeof setTimeout> | undefined;
    let retryDelay = RETRY_FIRST_MS;

    const refresh = async () => {
      if (!active || !navigator.onLine) return;
      await refreshCatalogue(memberId).catch(() => undefined);
    };
    const sendWaiting = async () => {
      clearTimeout(retryTimer);
      if (!active || !navigator.onLine) return;
      const result = await replayQueue(memberId, (entry) => settled.current(entry)).catch(() => ({ sent: [], refused: [], stopped: true }));
      if (!active) return;
      if (result.sent.length + result.refused.length > 0) void refresh();
      if (result.stopped) {
        retryTimer = setTimeout(() => void sendWaiting(), retryDelay);
        retryDelay = Math.min(retryDelay * 2, RETRY_MOST_MS);
      } else {
        retryDelay = RETRY_FIRST_MS;
      }
    };
    sendNow.current = sendWaiting;

    const ready = (prepared.current?.() ?? Promise.resolve()).catch(() => undefined);
    void ready.then(() => forgetOtherCatalogues(memberId)).then(async () => {
      await sendWaiting();
      await refresh();
    });

    const onOnline = () => void sendWaiting().then(refresh);
    const onVisible = () => {
      if (document.visibilityState === 'visible') void refresh();
    };
    let answered = !isOffline();
    const stopListening = onReachability((now) => {
      if (now && !answered) void sendWaiting();
      answered = now;
    });
    const every = setInterval(() => {
      if (document.visibilityState === 'visible') void refresh();
    }, REFRESH_EVERY_MS);
    // The Wi-Fi is up but Gripline did not answer: ask again now and then, so the pages come back.
    const probe = setInterval(() => {
      if (navigator.onLine && isOffline()) void refresh();
    }, PROBE_EVERY_MS);
    // A change made online (a check out, a draw, a new tool) makes the copy stale: take a new one.
    const stopWatchingChanges = queryClient.getMutationCache().subscribe((event) => {
      if (event.type === 'updated' && event.action.type === 'success') {
        clearTimeout(refreshTimer);
        refreshTimer = setTimeout(() => void refresh(), 1_000);
      }
    });
    window.addEventListener('online', onOnline);
    document.addEventListener('visibilitychange', onVisible);
    return () => {
      active = false;
      clearTimeout(retryTimer);
      clearTimeout(refreshTimer);
      clearInterval(every);
      clearInterval(probe);
      stopListening();
      stopWatchingChanges();
      window.removeEventListener('online', onOnline);
      document.removeEventListener('visibilitychange', onVisible);
    };
  }, [memberId, queryClient]);

  // Queued while the server only seemed out of reach, or it answers again: send now.
  const before = useRef(0);
  useEffect(() => {
    if (!offline && waiting > before.current) void sendNow.current?.();
    before.current = offline ? 0 : waiting;
  }, [offline, waiting]);

  return null;
}
