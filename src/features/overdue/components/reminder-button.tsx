import { toast } from 'sonner';
import type { OverdueLoan } from '@shared/schemas/overdue';
import { Button } from '@/components/ui/button';
import { messageOf } from '@/lib/errors';
import { useSendReminder } from '../api/send-reminder';
import { formatDateTime } from '@/lib/format';

/**
 * One reminder a day per loan: once sent, the button stays disabled and says why. `onSettled`:
 * what else to refresh once it has gone (home's own answer, when sent from home).
 */
export function ReminderButton({ loan, onSettled }: { loan: OverdueLoan; onSettled?: () => void }) {
  const send = useSendReminder();
  const reasonId = `reminder-reason-${loan.loanId}`;
  const remind = () =>
    send.mutate(loan.loanId, {
      onSuccess: (r) => toast.success(`Reminder sent to ${loan.holder.name} (${r.sentTo}).`),
      onError: (err) => toast.error(messageOf(err)),
      onSettled,
    });
  return (
    <div className="flex flex-col items-start gap-1">
      <Button
        variant="secondary"
        className="disabled:border-steel disabled:bg-paper disabled:text-steel"
        onClick={remind}
        busy={send.isPending}
        disabled={loan.remindedToday}
        aria-describedby={reasonId}
      >
        Send reminder
      </Button>
      <p id={reasonId} className="text-sm text-steel">
        {loan.remindedToday
          ? 'Already reminded today; the next one can go tomorrow.'
          : loan.lastReminderAt
            ? `Last reminded ${formatDateTime(loan.lastReminderAt)}.`
            : 'Not reminded yet.'}
      </p>
    </div>
  );
}
