/** How long the page must have fetched nothing before the new version is asked to take over. */
export const QUIET_BEFORE_UPDATE_MS = 2_000;

/** When the page's latest fetch (a script, a style, an API answer) finished, in `performance.now()` time. */
function lastResourceEnd(): number {
  return performance.getEntriesByType('resource').reduce((latest, entry) => Math.max(latest, (entry as PerformanceResourceTiming).responseEnd), 0);
}

/**
 * Resolves once the page has fetched nothing for `quietMs`. Chromium leaves a waiting service worker
 * "installed" for good when its skipWaiting() arrives while the old worker is still busy with the
 * page's fetches (the chunks of a lazy page just opened, say), and a second skipWaiting() does not
 * restart the hand-over. Asked after a quiet moment, the new version takes over at once.
 */
export function networkQuiet(
  quietMs = QUIET_BEFORE_UPDATE_MS,
  clock: { now: () => number; lastResourceEnd: () => number } = { now: () => performance.now(), lastResourceEnd },
): Promise<void> {
  return new Promise((resolve) => {
    const check = () => {
      const wait = clock.lastResourceEnd() + quietMs - clock.now();
      if (wait <= 0) resolve();
      else setTimeout(check, wait);
    };
    check();
  });
}
