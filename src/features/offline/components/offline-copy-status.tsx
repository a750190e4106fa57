import { formatTimeAgo } from '@/lib/format';
import { useCatalogueCopy, useNow } from '../hooks';

/** On the Scan screen: whether this phone can still recognise labels when the Wi-Fi drops. */
export function OfflineCopyStatus({ memberId }: { memberId: number }) {
  const copy = useCatalogueCopy(memberId);
  const now = useNow();
  if (copy === undefined) return null;
  return (
    <p className="text-sm text-steel" data-testid="offline-copy-status">
      {copy
        ? `Offline copy on this phone, from ${formatTimeAgo(copy.catalogue.takenAt, now)}: scans still open tools and bins without a connection.`
        : 'No offline copy on this phone yet: without a connection, scans cannot open tools and bins.'}
    </p>
  );
}
