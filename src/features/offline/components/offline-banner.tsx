import { Link } from 'react-router';
import { formatTimeAgo } from '@/lib/format';
import { useOffline } from '../connection';
import { useCatalogueCopy, useNow, useRefused, useWaiting } from '../hooks';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * A quiet line under the header: offline (and how old the copy scans use is), actions waiting to
 * send, and actions the server refused. Always in the page, so screen readers hear it change.
 */
export function OfflineBanner({ memberId }: { memberId: number }) {
  const offline = useOffline();
  const copy = useCatalogueCopy(memberId);
  const waiting = useWaiting(memberId)?.length ?? 0;
  const refused = useRefused(memberId)?.length ?? 0;
  const now = useNow();
  const shown = offline || waiting > 0 || refused > 0;
  return (
    <div role="status" className={shown ? 'border-b border-brass bg-warn-soft text-ink' : 'sr-only'}>
      {shown && (
        <div className="mx-auto flex max-w-5xl flex-col gap-1 px-4 py-2 text-sm sm:flex-row sm:flex-wrap sm:items-center sm:gap-x-4">
          {offline && (
            <p>
              <strong>Offline</strong> —{' '}
              {copy
                ? `scans use the copy from ${formatTimeAgo(copy.catalogue.takenAt, now)}; check out, return and draw will be sent when the connection is back.`
                : 'this phone has no copy of the catalogue yet, so scans need the connection.'}
            </p>
          )}
          {waiting > 0 && (
            <p>
              <Link to="/queue" className="font-semibold underline underline-offset-4">
                {plural(waiting, 'action', 'actions')} waiting to send
              </Link>
            </p>
          )}
          {refused > 0 && (
            <p>
              <Link to="/queue" className="font-semibold text-bad underline underline-offset-4">
                {refused} not sent — see why
              </Link>
            </p>
          )}
        </div>
      )}
    </div>
  );
}
