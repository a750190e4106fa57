import { liveQuery } from 'dexie';
import { useEffect, useState } from 'react';
import { readCatalogue } from './api/catalogue';
import { refusedOf, waitingOf } from './api/queue';
import { readStationCopy } from './api/station-copy';
import { stationRefusedOf, stationWaitingOf } from './api/station-queue';
import type { QueuedAction, StoredCatalogue, StoredStationCopy } from './db';

/** The answer of a query on the phone's store, kept current as the store changes; undefined while it loads. */
function useLive<A, T>(query: (arg: A) => Promise<T>, arg: A): T | undefined {
  const [state, setState] = useState<{ arg: A; value: T }>();
  useEffect(() => {
    const subscription = liveQuery(() => query(arg)).subscribe({
      next: (value) => setState({ arg, value }),
      error: () => setState(undefined),
    });
    return () => subscription.unsubscribe();
  }, [query, arg]);
  return state && state.arg === arg ? state.value : undefined;
}

const catalogueOrNull = async (memberId: number): Promise<StoredCatalogue | null> => (await readCatalogue(memberId)) ?? null;

/** The member's copy; null when the phone has none, undefined while it is read. */
export const useCatalogueCopy = (memberId: number): StoredCatalogue | null | undefined => useLive(catalogueOrNull, memberId);
export const useWaiting = (memberId: number): QueuedAction[] | undefined => useLive(waitingOf, memberId);
export const useRefused = (memberId: number): QueuedAction[] | undefined => useLive(refusedOf, memberId);

const stationCopyOrNull = async (stationId: number): Promise<StoredStationCopy | null> => (await readStationCopy(stationId)) ?? null;

/** The crib station's copy; null when it has none, undefined while it is read. */
export const useStationCopy = (stationId: number): StoredStationCopy | null | undefined => useLive(stationCopyOrNull, stationId);
export const useStationWaiting = (stationId: number): QueuedAction[] | undefined => useLive(stationWaitingOf, stationId);
export const useStationRefused = (stationId: number): QueuedAction[] | undefined => useLive(stationRefusedOf, stationId);

/** The time now, moving on every half minute, so "10 min ago" stays true while the page is open. */
export function useNow(): Date {
  const [now, setNow] = useState(() => new Date());
  useEffect(() => {
    const timer = setInterval(() => setNow(new Date()), 30_000);
    return () => clearInterval(timer);
  }, []);
  return now;
}
