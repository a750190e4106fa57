import { useState } from 'react';
import { toast } from 'sonner';
import type { Station } from '@shared/schemas/stations';
import { Button } from '@/components/ui/button';
import { messageOf } from '@/lib/errors';
import { formatDateTime } from '@/lib/format';
import { useRevokeStation } from '../api/stations';

/** The stations enrolled, newest first as the server sends them, each revocable after a confirm. */
export function StationList({ stations }: { stations: Station[] }) {
  if (stations.length === 0) return <p className="text-steel">No station yet. Enrol the crib's tablet below.</p>;
  return (
    <ul className="flex flex-col divide-y divide-rule">
      {stations.map((station) => (
        <StationRow key={station.id} station={station} />
      ))}
    </ul>
  );
}

function StationRow({ station }: { station: Station }) {
  const revoke = useRevokeStation();
  const [confirming, setConfirming] = useState(false);

  return (
    <li className="flex flex-wrap items-center justify-between gap-3 py-3">
      <div>
        <p className="font-semibold">{station.name}</p>
        <p className="text-sm text-steel">
          Enrolled {formatDateTime(station.enrolledAt)} by {station.enrolledBy}
          {station.revokedAt && ` · revoked ${formatDateTime(station.revokedAt)}`}
        </p>
      </div>
      {!station.revokedAt &&
        (confirming ? (
          <div className="flex flex-wrap gap-2">
            <Button
              variant="danger"
              busy={revoke.isPending}
              onClick={() =>
                revoke.mutate(station.id, {
                  onSuccess: () => toast.success(`${station.name} is no longer a station; whoever was signed in there is signed out.`),
                  onError: (err) => toast.error(messageOf(err)),
                  onSettled: () => setConfirming(false),
                })
              }
            >
              Confirm revoke {station.name}
            </Button>
            <Button variant="quiet" onClick={() => setConfirming(false)}>
              Cancel
            </Button>
          </div>
        ) : (
          <Button variant="secondary" onClick={() => setConfirming(true)}>
            Revoke {station.name}
          </Button>
        ))}
    </li>
  );
}
