import { useSuspenseQuery } from '@tanstack/react-query';
import { peopleQueryOptions } from '@/features/people/api/get-people';
import { signoffRequestsQueryOptions } from '@/features/signoffs/api/get-signoff-requests';
import { signoffsQueryOptions } from '@/features/signoffs/api/get-signoffs';
import { SignoffCaution } from '@/features/signoffs/components/signoff-caution';
import { SignoffForm } from '@/features/signoffs/components/signoff-form';
import { SignoffList } from '@/features/signoffs/components/signoff-list';
import { SignoffRequestList } from '@/features/signoffs/components/signoff-request-list';
import { LinkButton } from '@/components/ui/link-button';
import { Card, PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const signoffsLoader = pageLoader('lead', [signoffsQueryOptions(), peopleQueryOptions(), signoffRequestsQueryOptions()]);

export function SignoffsRoute() {
  const { data: signoffs } = useSuspenseQuery(signoffsQueryOptions());
  const { data: people } = useSuspenseQuery(peopleQueryOptions());
  const { data: requests } = useSuspenseQuery(signoffRequestsQueryOptions());
  const active = people.filter((p) => p.active).map((p) => ({ id: p.id, name: p.name }));
  return (
    <>
      <PageHeader
        title="Sign-offs"
        lead="Who may use which powered tools."
        actions={
          <LinkButton to="/settings" variant="secondary">
            Hold time and time zone
          </LinkButton>
        }
      />
      <div className="flex flex-col gap-4">
        <SignoffCaution />
        <Card title={`Sign-off requests (${requests.length})`}>
          <SignoffRequestList requests={requests} />
        </Card>
        <Card title="Define a sign-off">
          <SignoffForm />
        </Card>
        <SignoffList signoffs={signoffs} people={active} />
      </div>
    </>
  );
}
