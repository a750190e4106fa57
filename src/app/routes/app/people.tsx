import { useSuspenseQuery } from '@tanstack/react-query';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { invitationsQueryOptions } from '@/features/people/api/get-invitations';
import { peopleQueryOptions } from '@/features/people/api/get-people';
import { InviteForm } from '@/features/people/components/invite-form';
import { PendingInvitations } from '@/features/people/components/pending-invitations';
import { PeopleTable } from '@/features/people/components/people-table';
import { Card, PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const peopleLoader = pageLoader('lead', [peopleQueryOptions(), invitationsQueryOptions()]);

export function PeopleRoute() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: people } = useSuspenseQuery(peopleQueryOptions());
  const { data: invitations } = useSuspenseQuery(invitationsQueryOptions());
  return (
    <>
      <PageHeader title="People" lead="Who belongs to the chapter, their role, and who may sign in." />
      <div className="flex flex-col gap-4">
        <Card title="Invite someone">
          <InviteForm />
        </Card>
        <Card title="Waiting invitations">
          <PendingInvitations invitations={invitations} />
        </Card>
        <PeopleTable people={people} selfId={me?.id ?? 0} />
      </div>
    </>
  );
}
