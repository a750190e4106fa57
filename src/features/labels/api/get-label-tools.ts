import { queryOptions } from '@tanstack/react-query';
import type { ToolList } from '@shared/schemas/tools';
import { api } from '@/lib/api-client';
import { labelKeys } from './keys';

/** Every tool in the crib (up to 500), to pick the ones that need a label. */
export const labelToolsQueryOptions = () =>
  queryOptions({
    queryKey: labelKeys.tools(),
    queryFn: async () => (await api.get<ToolList>('/api/tools?pageSize=500')).data,
  });
