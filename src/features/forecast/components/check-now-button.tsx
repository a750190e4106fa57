import { toast } from 'sonner';
import { Button } from '@/components/ui/button';
import { messageOf } from '@/lib/errors';
import { useRefreshAlerts } from '../api/alert-actions';

/** Runs the daily check on every bin now and says how many new alerts it raised. */
export function CheckNowButton() {
  const refresh = useRefreshAlerts();
  const run = () =>
    refresh.mutate(undefined, {
      onSuccess: ({ raised }) =>
        toast.success(raised === 0 ? 'Checked every bin: no new alerts.' : `Checked every bin: ${raised} new ${raised === 1 ? 'alert' : 'alerts'}.`),
      onError: (err) => toast.error(messageOf(err)),
    });
  return (
    <Button variant="secondary" busy={refresh.isPending} onClick={run}>
      Check now
    </Button>
  );
}
