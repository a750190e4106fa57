import { queryOptions } from '@tanstack/react-query';
import type { ToolList, ToolListQuery } from '@shared/schemas/tools';
import { api } from '@/lib/api-client';
import { toolKeys } from './keys';

export const toolsQueryOptions = (filters: Partial<ToolListQuery> = { pageSize: 500 }) =>
  queryOptions({
    queryKey: toolKeys.list(filters),
    queryFn: () => {
      const params = new URLSearchParams(Object.entries(filters).filter(([, v]) => v !== undefined && v !== '').map(([k, v]) => [k, String(v)]));
      return api.get<ToolList>(`/api/tools?${params.toString()}`);
    },
  });
