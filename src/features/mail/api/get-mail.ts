import { queryOptions } from '@tanstack/react-query';
import type { CaughtMailList } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';

export const mailKeys = {
  all: ['mail'] as const,
  list: () => ['mail', 'list'] as const,
};

export const mailQueryOptions = () =>
  queryOptions({
    queryKey: mailKeys.list(),
    queryFn: () => api.get<CaughtMailList>('/api/mail'),
    refetchInterval: 10_000,
  });
