import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/page';
import { formatTimeAgo } from '@/lib/format';
import { dismissRefused } from '../api/queue';
import type { QueuedAction } from '../db';
import { useRefused, useWaiting } from '../hooks';
import { describeAction } from '../utils/describe';

function Entry({ entry }: { entry: QueuedAction }) {
  return (
    <>
      <p className="font-semibold">{describeAction(entry)}</p>
      <p className="text-sm text-steel">
        {entry.what} · done {formatTimeAgo(entry.performedAt)}
      </p>
    </>
  );
}

/** The member's queued actions: those still waiting, in order, and those the server refused, with why. */
export function QueueList({ memberId }: { memberId: number }) {
  const waiting = useWaiting(memberId);
  const refused = useRefused(memberId);
  if (!waiting || !refused) return <p role="status">Reading the queue…</p>;
  return (
    <div className="flex flex-col gap-4">
      <Card title={`Waiting to send (${waiting.length})`}>
        {waiting.length === 0 ? (
          <p className="text-steel">Nothing is waiting: everything you did has reached Gripline.</p>
        ) : (
          <>
            <p className="mb-3 text-sm">They go in this order as soon as the connection is back. Keep Gripline open until they have gone.</p>
            <ol className="flex flex-col divide-y divide-rule">
              {waiting.map((entry) => (
                <li key={entry.seq} className="py-2">
                  <Entry entry={entry} />
                </li>
              ))}
            </ol>
          </>
        )}
      </Card>
      <Card title={`Not sent (${refused.length})`}>
        {refused.length === 0 ? (
          <p className="text-steel">Gripline has refused nothing.</p>
        ) : (
          <ul className="flex flex-col divide-y divide-rule">
            {refused.map((entry) => (
              <li key={entry.seq} className="flex flex-col gap-1 py-3">
                <Entry entry={entry} />
                <p>
                  <strong>Why:</strong> {entry.refusal?.message}
                </p>
                <p>
                  <strong>What to do:</strong> {entry.refusal?.nextStep}
                </p>
                <Button variant="secondary" className="self-start" onClick={() => void dismissRefused(entry.seq, memberId)}>
                  Dismiss <span className="sr-only">{describeAction(entry)}</span>
                </Button>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </div>
  );
}
