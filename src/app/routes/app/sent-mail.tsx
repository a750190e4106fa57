import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { mailQueryOptions } from '@/features/mail/api/get-mail';
import { MailList } from '@/features/mail/components/mail-list';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';
import { requireRole } from './guards';

export const sentMailLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await requireRole(queryClient, request, 'lead');
  await queryClient.ensureQueryData(mailQueryOptions());
  return null;
};

export function SentMailRoute() {
  const { data } = useSuspenseQuery(mailQueryOptions());
  return (
    <>
      <PageHeader title="Sent mail" lead="Invitations and password resets Gripline has sent, newest first." />
      <div className="flex flex-col gap-4">
        {data.catching ? (
          <Notice title="Mail stays on this computer">
            No mail server is configured, so Gripline keeps its messages here instead of sending them. Open a link below to act on
            it, or set SMTP_URL to send real mail.
          </Notice>
        ) : (
          <Notice title="Mail goes out through the configured server">This list shows only mail caught locally, so it may be empty.</Notice>
        )}
        <MailList messages={data.data} />
      </div>
    </>
  );
}
