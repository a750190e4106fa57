import { useMemo } from 'react';
import type { CopyInUse, StoredStationCopy } from '../db';
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
}

/**
 * A tool or bin scanned at the station while offline: the offline views of the phone, working from
 * the person's catalogue composed from the station's copy; what they do is queued for the station.
 */
export function StationOfflineItem({ stored, person, badge, item }: StationOfflineItemProps) {
  const waitingHere = useStationWaiting(stored.stationId);
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
