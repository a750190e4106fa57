import { queryOptions } from '@tanstack/react-query';
import type { PurchaseList } from '@shared/schemas/forecast';
import { api } from '@/lib/api-client';
import { alertKeys } from './keys';

/** What to order now (the Restock list's bins and quantities), grouped by supplier. */
export const purchaseListQueryOptions = () =>
  queryOptions({
    queryKey: alertKeys.purchaseList(),
    queryFn: async () => (await api.get<PurchaseList>('/api/alerts/purchase-list')).data,
  });

/** A plain link downloads it: the browser sends the session cookie with a GET. */
export const PURCHASE_LIST_CSV = '/api/alerts/purchase-list.csv';
