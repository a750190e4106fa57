import { Button } from '@/components/ui/button';
import { dismissStationRefused } from '../api/station-queue';
import { useStationRefused, useStationWaiting } from '../hooks';
import { describeAction } from '../utils/describe';

/**
 * On the station's badge screen: how many actions done here offline still wait to be sent, and
 * those the server refused (who, what, and the server's sentence), each gone once someone taps Seen.
 */
export function StationQueuePanel({ stationId }: { stationId: number }) {
  const waiting = useStationWaiting(stationId)?.length ?? 0;
  const refused = useStationRefused(stationId) ?? [];
  return (
    <div className="flex flex-col gap-3">
      <p role="status" className={waiting > 0 ? 'text-xl font-semibold' : 'sr-only'}>
        {waiting > 0 && `${waiting === 1 ? '1 action waits' : `${waiting} actions wait`} to be sent.`}
      </p>
      {refused.length > 0 && (
        <section aria-labelledby="station-not-sent" className="rounded-lg bg-card px-4 py-3 text-ink">
          <h2 id="station-not-sent" className="text-2xl font-bold">
            Not sent
          </h2>
          <ul className="flex flex-col divide-y divide-rule">
            {refused.map((entry) => (
              <li key={entry.seq} className="flex flex-wrap items-center justify-between gap-3 py-3">
                <div>
                  <p className="text-lg font-semibold">
                    {entry.station?.personName}: {describeAction(entry)} <span className="font-normal">({entry.what})</span>
                  </p>
                  <p>{entry.refusal?.message}</p>
                </div>
                <Button variant="secondary" onClick={() => void dismissStationRefused(entry.seq, stationId)}>
                  Seen <span className="sr-only">{`${entry.station?.personName ?? ''}: ${describeAction(entry)}`}</span>
                </Button>
              </li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}
