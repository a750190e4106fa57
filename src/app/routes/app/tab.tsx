import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { myTabQueryOptions } from '@/features/stock-money/api/get-my-tab';
import { TabView } from '@/features/stock-money/components/tab-view';
import { PageHeader } from '@/components/ui/page';
import { requireSignedIn } from './guards';

export const tabLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await requireSignedIn(queryClient, request);
  await queryClient.ensureQueryData(myTabQueryOptions());
  return null;
};

export function TabRoute() {
  const { data: tab } = useSuspenseQuery(myTabQueryOptions());
  return (
    <>
      <PageHeader title="My tab" lead="What you drew from the bins, valued at the unit cost on the day, and what you have paid." />
      <TabView tab={tab} />
    </>
  );
}
