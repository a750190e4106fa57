import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { restockQueryOptions } from '@/features/stock/api/get-restock';
import { RestockList } from '@/features/stock/components/restock-list';
import { PageHeader } from '@/components/ui/page';
import { loadAlongside, requireRole } from './guards';

export const restockLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await loadAlongside(requireRole(queryClient, request, 'quartermaster'), queryClient.ensureQueryData(restockQueryOptions()));
  return null;
};

export function RestockRoute() {
  const { data } = useSuspenseQuery(restockQueryOptions());
  return (
    <>
      <PageHeader title="Restock" lead="Bins to order now, in whole packs: the same bins and quantities as the purchase list on Reorder alerts." />
      <RestockList items={data} />
    </>
  );
}
