import { useSuspenseQuery } from '@tanstack/react-query';
import { mailQueryOptions } from '@/features/mail/api/get-mail';
import { MailList } from '@/features/mail/components/mail-list';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const sentMailLoader = pageLoader('lead', [mailQueryOptions()]);

export function SentMailRoute() {
  const { data } = useSuspenseQuery(mailQueryOptions());
  return (
    <>
      <PageHeader title="Sent mail" lead="Every message Gripline has written, newest first: waiting, sent or failed." />
      <div className="flex flex-col gap-4">
        {data.catching ? (
          <Notice title="Mail stays on this computer">
            No mail server is configured, so Gripline keeps its messages here instead of sending them. Open an invitation link below to
            hand it on, or set SMTP_URL to send real mail. A password reset link is shown only to the person it was sent to, on My mail.
          </Notice>
        ) : (
          <Notice title="Mail goes out through the configured server">
            A message the server refuses is tried again, waiting longer each time; after the last try it is marked failed and can be retried here.
          </Notice>
        )}
        <MailList messages={data.data} canRetry empty="No mail has been written yet. Invite someone and it shows up here." />
      </div>
    </>
  );
}
