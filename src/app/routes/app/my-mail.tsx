import { useSuspenseQuery } from '@tanstack/react-query';
import { myMailQueryOptions } from '@/features/mail/api/get-mail';
import { MailList } from '@/features/mail/components/mail-list';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const myMailLoader = pageLoader('member', [myMailQueryOptions()]);

export function MyMailRoute() {
  const { data } = useSuspenseQuery(myMailQueryOptions());
  return (
    <>
      <PageHeader title="My mail" lead="The messages Gripline has sent you, newest first." />
      {data.catching ? (
        <MailList messages={data.data} empty="Gripline has not written to you yet." />
      ) : (
        <Notice title="Your mail goes to your inbox">Gripline sends its messages through the chapter's mail server; look for them in your e-mail.</Notice>
      )}
    </>
  );
}
