import { useState } from 'react';
import { toast } from 'sonner';
import type { Signoff, SignoffHolder } from '@shared/schemas/signoffs';
import { Button } from '@/components/ui/button';
import { messageOf } from '@/lib/errors';
import { useRevokeSignoff } from '../api/revoke-signoff';
import { formatGrantDate } from './format';

/** One holder; revoking asks to confirm first, and the record of the grant stays. */
function HolderRow({ signoff, holder }: { signoff: Signoff; holder: SignoffHolder }) {
  const revoke = useRevokeSignoff();
  const [confirming, setConfirming] = useState(false);

  const confirm = () =>
    revoke.mutate(
      { signoffId: signoff.id, userId: holder.userId },
      {
        onSuccess: () => toast.success(`${holder.name} is no longer signed off for ${signoff.name}.`),
        onError: (err) => toast.error(messageOf(err)),
        onSettled: () => setConfirming(false),
      },
    );

  return (
    <li className="flex flex-col gap-2 py-3 sm:flex-row sm:items-center sm:justify-between">
      <div>
        <div className="font-medium">
          {holder.name}
          {!holder.active && <span className="ml-2 text-sm font-normal text-bad">(deactivated)</span>}
        </div>
        <div className="text-sm text-steel">
          Signed off {formatGrantDate(holder.grantedAt)} by {holder.grantedBy.name}
        </div>
      </div>
      {confirming ? (
        <div className="flex flex-col gap-2 sm:items-end">
          <p className="text-sm">
            {holder.name} will not be able to check out tools that need {signoff.name} until signed off again.
          </p>
          <div className="flex flex-wrap gap-2">
            <Button variant="danger" busy={revoke.isPending} onClick={confirm}>
              Confirm revoke
            </Button>
            <Button variant="quiet" onClick={() => setConfirming(false)}>
              Keep
            </Button>
          </div>
        </div>
      ) : (
        <Button variant="secondary" aria-label={`Revoke ${holder.name}'s ${signoff.name} sign-off`} onClick={() => setConfirming(true)}>
          Revoke
        </Button>
      )}
    </li>
  );
}

export function HolderList({ signoff }: { signoff: Signoff }) {
  if (signoff.holders.length === 0) return <p className="text-steel">Nobody holds this sign-off yet.</p>;
  return (
    <ul className="divide-y divide-rule">
      {signoff.holders.map((h) => (
        <HolderRow key={h.userId} signoff={signoff} holder={h} />
      ))}
    </ul>
  );
}
