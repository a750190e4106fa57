import { formatTimeAgo } from '@/lib/format';
import type { StoredStationCopy } from '../db';
import { useNow } from '../hooks';

/** On the badge screen: whether the station can go on when the Wi-Fi drops, and how old its copy is. */
export function StationCopyStatus({ copy, offline }: { copy: StoredStationCopy | null | undefined; offline: boolean }) {
  const now = useNow();
  if (copy === undefined) return null;
  return (
    <p className="text-lg text-card/80" data-testid="station-copy-status">
      {copy
        ? offline
          ? `No connection: badges and PINs are checked against the copy from ${formatTimeAgo(copy.copy.takenAt, now)}.`
          : `Ready without the network: copy from ${formatTimeAgo(copy.copy.takenAt, now)}.`
        : 'No copy on this station yet: without the network, it cannot take badges.'}
    </p>
  );
}
