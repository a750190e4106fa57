import { queryOptions } from '@tanstack/react-query';
import type { MySignoff } from '@shared/schemas/signoffs';
import { api } from '@/lib/api-client';
import { signoffKeys } from './keys';

export const mySignoffsQueryOptions = () =>
  queryOptions({
    queryKey: signoffKeys.mine(),
    queryFn: async () => (await api.get<{ data: MySignoff[] }>('/api/signoffs/mine')).data,
  });
