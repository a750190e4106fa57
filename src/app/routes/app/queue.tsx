import { useSuspenseQuery } from '@tanstack/react-query';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { QueueList } from '@/features/offline/components/queue-list';
import { PageHeader } from '@/components/ui/page';

/** What the member did without a connection: still waiting to send, or refused by the server. */
export function QueueRoute() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  if (!me) return null;
  return (
    <>
      <PageHeader title="Waiting to send" lead="What you did on this phone without a connection, and what Gripline could not accept." />
      <QueueList memberId={me.id} />
    </>
  );
}
