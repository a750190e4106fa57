import { formatTimeAgo } from '@/lib/format';
import type { QueuedAction } from '../db';
import { describeAction } from '../utils/describe';

/** This tool's or bin's own actions still waiting on the phone. */
export function WaitingHere({ waiting }: { waiting: QueuedAction[] }) {
  if (waiting.length === 0) return null;
  return (
    <div className="rounded-lg border-l-4 border-brass bg-paper px-4 py-3">
      <p className="font-semibold">Waiting to send</p>
      <ul className="mt-1 text-sm">
        {waiting.map((a) => (
          <li key={a.seq}>
            {describeAction(a)}, done {formatTimeAgo(a.performedAt)}
          </li>
        ))}
      </ul>
    </div>
  );
}
