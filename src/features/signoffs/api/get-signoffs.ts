import { queryOptions } from '@tanstack/react-query';
import type { Signoff } from '@shared/schemas/signoffs';
import { api } from '@/lib/api-client';
import { signoffKeys } from './keys';

export const signoffsQueryOptions = () =>
  queryOptions({
    queryKey: signoffKeys.list(),
    queryFn: async () => (await api.get<{ data: Signoff[] }>('/api/signoffs')).data,
  });
