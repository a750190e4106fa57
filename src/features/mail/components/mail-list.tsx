import type { CaughtMail } from '@shared/schemas/mail';
import { Code } from '@/components/ui/page';
import { formatDateTime } from '@/lib/format';


const LINK_WORDS: Record<string, string> = {
  invite: 'Open the invitation link',
  'reset-password': 'Open the password reset link',
};

function linkLabel(link: string): string {
  return LINK_WORDS[new URL(link).pathname.split('/')[1] ?? ''] ?? `Open ${link}`;
}

/** Sent messages, newest first, each with its links ready to open. */
export function MailList({ messages }: { messages: CaughtMail[] }) {
  if (messages.length === 0) return <p className="text-steel">No mail has been sent yet. Invite someone and it shows up here.</p>;
  return (
    <ul className="flex flex-col gap-3">
      {messages.map((m) => (
        <li key={m.id} className="rounded-xl border border-rule bg-card p-4">
          <details>
            <summary className="flex min-h-11 cursor-pointer list-none flex-col gap-0.5">
              <span className="font-semibold">{m.subject}</span>
              <span className="text-sm text-steel">
                to <Code>{m.to.join(', ')}</Code> · {formatDateTime(m.receivedAt)}
              </span>
              <span className="text-sm font-medium underline underline-offset-4">Show the whole message</span>
            </summary>
            <pre className="mt-3 font-mono text-sm whitespace-pre-wrap">{m.text}</pre>
          </details>
          {m.links.length > 0 && (
            <ul className="mt-2 flex flex-col gap-1">
              {m.links.map((link) => (
                <li key={link}>
                  <a href={link} className="inline-flex min-h-11 items-center font-medium break-all underline underline-offset-4">
                    {linkLabel(link)}
                  </a>
                </li>
              ))}
            </ul>
          )}
        </li>
      ))}
    </ul>
  );
}
