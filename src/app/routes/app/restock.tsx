import { useSuspenseQuery } from '@tanstack/react-query';
import { restockQueryOptions } from '@/features/stock/api/get-restock';
import { RestockList } from '@/features/stock/components/restock-list';
import { PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const restockLoader = pageLoader('quartermaster', [restockQueryOptions()]);

export function RestockRoute() {
  const { data } = useSuspenseQuery(restockQueryOptions());
  return (
    <>
      <PageHeader title="Restock" lead="Bins to order now, in whole packs: the same bins and quantities as the purchase list on Reorder alerts." />
      <RestockList items={data} />
    </>
  );
}
