import { queryOptions } from '@tanstack/react-query';
import type { ToolEvent, ToolForYou } from '@shared/schemas/tools';
import { api } from '@/lib/api-client';
import { toolKeys } from './keys';

export const toolQueryOptions = (code: string) =>
  queryOptions({
    queryKey: toolKeys.detail(code),
    queryFn: () => api.getOrGiveUp<ToolForYou>(`/api/tools/${encodeURIComponent(code)}`),
    retry: false,
  });

export const toolEventsQueryOptions = (code: string) =>
  queryOptions({
    queryKey: toolKeys.events(code),
    queryFn: async () => (await api.get<{ data: ToolEvent[] }>(`/api/tools/${encodeURIComponent(code)}/events`)).data,
  });
