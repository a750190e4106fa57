import { toast } from 'sonner';
import { ROLE_LABELS } from '@shared/roles';
import type { PendingInvitation } from '@shared/schemas/people';
import { Button } from '@/components/ui/button';
import { Code } from '@/components/ui/page';
import { messageOf } from '@/lib/errors';
import { formatDateTime } from '@/lib/format';
import { useWithdrawInvitation } from '../api/withdraw-invitation';


export function PendingInvitations({ invitations }: { invitations: PendingInvitation[] }) {
  const withdraw = useWithdrawInvitation();
  if (invitations.length === 0) return <p className="text-steel">No invitations are waiting for an answer.</p>;
  return (
    <ul className="divide-y divide-rule">
      {invitations.map((inv) => (
        <li key={inv.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
          <div>
            <Code>{inv.email}</Code>
            <div className="text-sm text-steel">
              {ROLE_LABELS[inv.role]} · invited by {inv.invitedBy} · link works until {formatDateTime(inv.expiresAt)}
            </div>
          </div>
          <Button
            variant="quiet"
            busy={withdraw.isPending && withdraw.variables === inv.id}
            onClick={() =>
              withdraw.mutate(inv.id, {
                onSuccess: () => toast.success(`Invitation to ${inv.email} withdrawn.`),
                onError: (err) => toast.error(messageOf(err)),
              })
            }
          >
            Withdraw
          </Button>
        </li>
      ))}
    </ul>
  );
}
