import { useState } from 'react';
import { toast } from 'sonner';
import type { SignoffRequest } from '@shared/schemas/signoff-requests';
import { Button } from '@/components/ui/button';
import { TextAreaField } from '@/components/ui/field';
import { Code } from '@/components/ui/page';
import { messageOf } from '@/lib/errors';
import { formatDateTime } from '@/lib/format';
import { useDeclineSignoffRequest } from '../api/answer-signoff-request';
import { useGrantSignoff } from '../api/grant-signoff';

/** One request: grant (the grant closes it) or decline with a reason the member reads in the mail. */
function RequestRow({ request, onAnswered }: { request: SignoffRequest; onAnswered?: () => void }) {
  const grant = useGrantSignoff();
  const decline = useDeclineSignoffRequest();
  const [declining, setDeclining] = useState(false);
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string>();
  const who = request.member.name;
  const settled = () => onAnswered?.();

  const signOff = () =>
    grant.mutate(
      { signoffId: request.signoff.id, userId: request.member.id },
      { onSuccess: () => toast.success(`${who} is signed off for ${request.signoff.name}.`), onError: (err) => toast.error(messageOf(err)), onSettled: settled },
    );
  const sendDecline = () => {
    if (!reason.trim()) return setError('Give the reason, so the member knows what to do next.');
    decline.mutate(
      { id: request.id, reason },
      { onSuccess: () => toast.success(`${who} has been told why.`), onError: (err) => toast.error(messageOf(err)), onSettled: settled },
    );
  };

  return (
    <li className="flex flex-col gap-2 py-3">
      <div>
        <div className="font-medium">
          {who} asks for {request.signoff.name}
        </div>
        <div className="text-sm text-steel">
          From <Code>{request.tool.code}</Code> {request.tool.name}, {formatDateTime(request.askedAt)}
        </div>
        {request.note && <p className="mt-1 text-sm">“{request.note}”</p>}
      </div>
      {declining ? (
        <div className="flex flex-col gap-2">
          <TextAreaField
            label={`Why not ${who}, yet?`}
            rows={2}
            value={reason}
            error={error}
            onChange={(e) => {
              setReason(e.target.value);
              setError(undefined);
            }}
          />
          <div className="flex flex-wrap gap-2">
            <Button variant="danger" busy={decline.isPending} onClick={sendDecline}>
              Decline
            </Button>
            <Button variant="quiet" onClick={() => setDeclining(false)}>
              Keep it open
            </Button>
          </div>
        </div>
      ) : (
        <div className="flex flex-wrap gap-2">
          <Button busy={grant.isPending} aria-label={`Sign off ${who} for ${request.signoff.name}`} onClick={signOff}>
            Sign off {who}
          </Button>
          <Button variant="secondary" aria-label={`Decline ${who}'s request`} onClick={() => setDeclining(true)}>
            Decline
          </Button>
        </div>
      )}
    </li>
  );
}

/** Open sign-off requests, the oldest first, each answered in place. */
export function SignoffRequestList({ requests, onAnswered }: { requests: SignoffRequest[]; onAnswered?: () => void }) {
  if (requests.length === 0) return <p className="text-steel">Nobody is waiting for a sign-off.</p>;
  return (
    <ul className="divide-y divide-rule">
      {requests.map((r) => (
        <RequestRow key={r.id} request={r} onAnswered={onAnswered} />
      ))}
    </ul>
  );
}
