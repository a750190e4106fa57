import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { toast } from 'sonner';
import { Button } from '@/components/ui/button';
import { TextAreaField } from '@/components/ui/field';
import { messageOf } from '@/lib/errors';
import { formatDateTime } from '@/lib/format';
import { useAskForSignoff } from '../api/answer-signoff-request';
import { mySignoffRequestsQueryOptions } from '../api/get-signoff-requests';
import { mySignoffsQueryOptions } from '../api/get-my-signoffs';

/**
 * On a tool's page, for a member who lacks the sign-off it needs: ask a lead for it (with an
 * optional note), or see that the request waits, or why the last one was declined.
 */
export function AskForSignoff({ toolCode, signoff }: { toolCode: string; signoff: { id: number; name: string } }) {
  const held = useQuery(mySignoffsQueryOptions());
  const requests = useQuery(mySignoffRequestsQueryOptions());
  const ask = useAskForSignoff();
  const [writing, setWriting] = useState(false);
  const [note, setNote] = useState('');
  if (!held.data || !requests.data || held.data.some((s) => s.id === signoff.id)) return null;
  const latest = requests.data.find((r) => r.signoff.id === signoff.id);

  if (latest?.state === 'open') {
    return (
      <section aria-labelledby="signoff-ask" className="rounded-xl border border-rule bg-card p-4">
        <h2 id="signoff-ask" className="text-lg font-semibold">
          Sign-off asked for
        </h2>
        <p className="mt-1">
          You asked for the {signoff.name} sign-off {formatDateTime(latest.askedAt)}. A chapter lead will answer, and Gripline e-mails you when they do.
        </p>
      </section>
    );
  }
  const send = () =>
    ask.mutate(
      { toolCode, note },
      {
        onSuccess: () => {
          toast.success(`Asked for the ${signoff.name} sign-off.`);
          setWriting(false);
        },
        onError: (err) => toast.error(messageOf(err)),
      },
    );
  return (
    <section aria-labelledby="signoff-ask" className="flex flex-col gap-3 rounded-xl border border-rule bg-card p-4">
      <h2 id="signoff-ask" className="text-lg font-semibold">
        Needs the {signoff.name} sign-off
      </h2>
      {latest?.state === 'declined' && (
        <p>
          Your last request was declined: {latest.declineReason}
        </p>
      )}
      {writing ? (
        <>
          <TextAreaField label="Note for the lead (optional)" hint="What you have done with such tools, or when you could be shown." rows={2} value={note} onChange={(e) => setNote(e.target.value)} />
          <div className="flex flex-wrap gap-2">
            <Button busy={ask.isPending} onClick={send}>
              Send the request
            </Button>
            <Button variant="quiet" onClick={() => setWriting(false)}>
              Not now
            </Button>
          </div>
        </>
      ) : (
        <Button variant="secondary" onClick={() => setWriting(true)}>
          Ask for a sign-off
        </Button>
      )}
    </section>
  );
}
