import { useQuery } from '@tanstack/react-query';
import { STATUS_LABELS, type ToolStatus } from '@shared/tools/categories';
import { Card } from '@/components/ui/page';
import { toolEventsQueryOptions } from '../api/get-tool';
import { formatDateTime } from '@/lib/format';

const ACTION_WORDS: Record<string, string> = {
  added: 'Added to the crib',
  edited: 'Details changed',
  checked_out: 'Checked out',
  returned: 'Returned',
  hold_placed: 'Hold placed',
  hold_cancelled: 'Hold cancelled',
  held: 'Held for the next person',
  hold_expired: 'Hold ran out',
  hold_released: 'Back on the shelf',
  hold_offer_ended: 'Offer ended, first in the queue again',
  accessory_found: 'Accessory found',
  accessory_replaced: 'Accessory replaced',
  out_of_service: 'Out of service',
  back_in_service: 'Back in service',
  serviced: 'Serviced',
  lost: 'Marked lost',
  found: 'Found',
  retired: 'Retired',
  photo_added: 'Photo added',
};

const statusWord = (s: string | null) => (s ? (STATUS_LABELS[s as ToolStatus] ?? s) : '');

/** The tool's audit trail: who, when, what, from and to. */
export function ToolHistory({ code }: { code: string }) {
  const events = useQuery(toolEventsQueryOptions(code));
  return (
    <Card title="History">
      {events.isPending && <p>Loading…</p>}
      {events.data && events.data.length === 0 && <p className="text-steel">Nothing has happened to this tool yet.</p>}
      <ol className="flex flex-col divide-y divide-rule">
        {events.data?.map((e) => (
          <li key={e.id} className="py-2">
            <p className="font-medium">
              {ACTION_WORDS[e.action] ?? e.action}
              {e.fromStatus && e.toStatus && e.fromStatus !== e.toStatus && (
                <span className="font-normal text-steel">
                  {' '}
                  · {statusWord(e.fromStatus)} → {statusWord(e.toStatus)}
                </span>
              )}
            </p>
            <p className="text-sm text-steel">
              {formatDateTime(e.at)} · {e.actor?.name ?? 'Gripline'}
              {e.station && ` at ${e.station}`}
            </p>
            {e.detail && <p className="text-sm">{e.detail}</p>}
          </li>
        ))}
      </ol>
    </Card>
  );
}
