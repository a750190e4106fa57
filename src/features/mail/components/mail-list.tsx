import { toast } from 'sonner';
import { MAIL_STATE_LABELS, MASKED_TOKEN, type MailMessage, type MailState } from '@shared/schemas/mail';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Code } from '@/components/ui/page';
import { messageOf } from '@/lib/errors';
import { formatDateTime } from '@/lib/format';
import { useRetryMail } from '../api/retry-mail';

const when = (iso: string) => formatDateTime(iso);

const LINK_WORDS: Record<string, string> = {
  invite: 'Open the invitation link',
  'reset-password': 'Open the password reset link',
};

const STATE_TONE: Record<MailState, string> = {
  waiting: 'border border-warn bg-warn-soft text-warn',
  sent: 'border border-ok bg-ok-soft text-ok',
  failed: 'border border-bad bg-bad-soft text-bad',
};

function linkLabel(link: string): string {
  return LINK_WORDS[new URL(link).pathname.split('/')[1] ?? ''] ?? `Open ${link}`;
}

function StateLine({ m }: { m: MailMessage }) {
  const tries = `${m.attempts} failed ${m.attempts === 1 ? 'attempt' : 'attempts'}`;
  return (
    <span className="flex flex-wrap items-center gap-2 text-sm text-steel">
      <Badge className={STATE_TONE[m.state]}>{MAIL_STATE_LABELS[m.state]}</Badge>
      {m.state === 'sent' && m.sentAt && <span>at {when(m.sentAt)}</span>}
      {m.state === 'waiting' && m.attempts > 0 && m.nextAttemptAt && (
        <span>
          {tries}; next try {when(m.nextAttemptAt)}
        </span>
      )}
      {m.state === 'failed' && <span>{tries}; no more tries until retried</span>}
    </span>
  );
}

function Links({ m }: { m: MailMessage }) {
  if (m.links.length === 0) return null;
  return (
    <ul className="mt-2 flex flex-col gap-1">
      {m.links.map((link) => (
        <li key={link}>
          {link.endsWith(MASKED_TOKEN) ? (
            <span className="inline-flex min-h-11 items-center text-steel">The reset link is hidden: only {m.to} may open it.</span>
          ) : (
            <a href={link} className="inline-flex min-h-11 items-center font-medium break-all underline underline-offset-4">
              {linkLabel(link)}
            </a>
          )}
        </li>
      ))}
    </ul>
  );
}

/** Messages, newest first, each with its state and links; `canRetry` offers Retry on failed ones (the lead). */
export function MailList({ messages, canRetry = false, empty }: { messages: MailMessage[]; canRetry?: boolean; empty: string }) {
  const retry = useRetryMail();
  if (messages.length === 0) return <p className="text-steel">{empty}</p>;
  return (
    <ul className="flex flex-col gap-3">
      {messages.map((m) => (
        <li key={m.id} className="rounded-xl border border-rule bg-card p-4">
          <details>
            <summary className="flex min-h-11 cursor-pointer list-none flex-col gap-1">
              <span className="font-semibold">{m.subject}</span>
              <span className="text-sm text-steel">
                to <Code>{m.to}</Code> · written {when(m.createdAt)}
              </span>
              <StateLine m={m} />
              <span className="text-sm font-medium underline underline-offset-4">Show the whole message</span>
            </summary>
            <pre className="mt-3 font-mono text-sm whitespace-pre-wrap">{m.text}</pre>
          </details>
          {m.lastError && m.state !== 'sent' && <p className="mt-2 text-sm break-words text-bad">The mail server said: {m.lastError}</p>}
          <Links m={m} />
          {canRetry && m.state === 'failed' && (
            <Button
              variant="secondary"
              className="mt-2"
              aria-label={`Retry the message to ${m.to}: ${m.subject}`}
              busy={retry.isPending && retry.variables === m.id}
              onClick={() =>
                retry.mutate(m.id, {
                  onSuccess: () => toast.success(`The message to ${m.to} is queued again.`),
                  onError: (err) => toast.error(messageOf(err)),
                })
              }
            >
              Retry
            </Button>
          )}
        </li>
      ))}
    </ul>
  );
}
