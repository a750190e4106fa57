import { toast } from 'sonner';
import type { ToolForYou } from '@shared/schemas/tools';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Card } from '@/components/ui/page';
import { messageOf } from '@/lib/errors';
import { formatDate } from '@/lib/format';
import { useCancelHold, usePlaceHold } from '../api/tool-actions';
import { CheckoutForm } from './checkout-form';
import { ReturnForm, type PhotoSlot } from './return-form';
import type { ActionDone } from '@/lib/action-done';

/** The one or two things the signed-in person may do with this tool now, or why not. */
export function ToolActionsPanel({ tool, photoSlot, onDone }: { tool: ToolForYou; photoSlot?: PhotoSlot; onDone?: ActionDone }) {
  const { actions, reason, yourHold } = tool.forYou;
  const placeHold = usePlaceHold();
  const cancelHold = useCancelHold();

  return (
    <Card title="What you can do">
      <div className="flex flex-col gap-4">
        {reason && (
          <Notice tone={actions.length > 0 ? 'info' : 'warn'} title={actions.length > 0 ? 'Good to know' : 'Not available to you now'}>
            {reason}
          </Notice>
        )}
        {yourHold && (
          <p>
            {yourHold.status === 'offered'
              ? 'It is held for you: check it out before the hold ends.'
              : yourHold.startsAt
                ? `Your hold starts on ${formatDate(yourHold.startsAt)}, the planned start of your assembly: it is set aside for you then, or when it comes back after that. We e-mail you.`
                : `You are number ${yourHold.position} in the queue. We e-mail you when it is your turn.`}
          </p>
        )}
        {actions.includes('check_out') && <CheckoutForm tool={tool} onDone={onDone} />}
        {actions.includes('return') && <ReturnForm tool={tool} photoSlot={photoSlot} onDone={onDone} />}
        {actions.includes('place_hold') && (
          <Button
            variant="secondary"
            busy={placeHold.isPending}
            onClick={() =>
              placeHold.mutate(tool.code, {
                onSuccess: (h) => toast.success(`You are number ${h.position} in the queue for ${tool.code}.`),
                onError: (err) => toast.error(messageOf(err)),
              })
            }
          >
            Place a hold
          </Button>
        )}
        {actions.includes('cancel_hold') && (
          <Button
            variant="quiet"
            busy={cancelHold.isPending}
            onClick={() =>
              cancelHold.mutate(tool.code, {
                onSuccess: () => toast.success(`You left the queue for ${tool.code}.`),
                onError: (err) => toast.error(messageOf(err)),
              })
            }
          >
            Cancel my hold
          </Button>
        )}
        {actions.length === 0 && !reason && <p className="text-steel">Nothing to do with this tool right now.</p>}
      </div>
    </Card>
  );
}
