import { useEffect, useMemo, useRef } from 'react';
import type { CopyInUse, QueuedAction, StoredStationCopy } from '../db';
import { useStationWaiting } from '../hooks';
import { catalogueFor } from '../utils/catalogue-for';
import { OfflineBinView } from './offline-bin-view';
import { OfflineToolView } from './offline-tool-view';

interface StationOfflineItemProps {
  stored: StoredStationCopy;
  person: { id: number; name: string };
  /** The badge they signed in with: the replay signs them in with it again. */
  badge: string;
  item: { kind: 'tool' | 'bin'; code: string };
  /** Something was queued for this item: the station goes back to its scan, saying so. */
  onQueued: () => void;
}

/**
 * A tool or bin scanned at the station while offline: the offline views of the phone, working from
 * the person's catalogue composed from the station's copy; what they do is queued for the station.
 */
export function StationOfflineItem({ stored, person, badge, item, onQueued }: StationOfflineItemProps) {
  const waitingHere = useStationWaiting(stored.stationId);
  useQueuedFor(waitingHere, person.id, item.code, onQueued);
  const source = useMemo(() => {
    if (!waitingHere) return { copy: null, waiting: undefined };
    const catalogue = catalogueFor(stored.copy, person.id, waitingHere);
    const copy: CopyInUse | null = catalogue ? { memberId: person.id, catalogue, station: { stationId: stored.stationId, badge, personName: person.name } } : null;
    return { copy, waiting: waitingHere.filter((a) => a.memberId === person.id) };
  }, [stored, person, badge, waitingHere]);
  if (!source.copy) return <p role="status">Opening the station’s copy…</p>;
  const view = { code: item.code, copy: source.copy, waiting: source.waiting };
  return item.kind === 'tool' ? <OfflineToolView {...view} /> : <OfflineBinView {...view} />;
}

/** Calls `onQueued` once the person has one more action waiting for this code than when it opened. */
function useQueuedFor(waiting: readonly QueuedAction[] | undefined, personId: number, code: string, onQueued: () => void) {
  const count = waiting?.filter((a) => a.memberId === personId && a.code === code).length;
  const atOpen = useRef<number | undefined>(undefined);
  useEffect(() => {
    if (count === undefined) return;
    if (atOpen.current === undefined) atOpen.current = count;
    else if (count > atOpen.current) onQueued();
  }, [count, onQueued]);
}
