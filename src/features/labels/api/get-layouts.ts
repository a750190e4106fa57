import { queryOptions } from '@tanstack/react-query';
import type { SheetLayoutDto } from '@shared/schemas/labels';
import { api } from '@/lib/api-client';
import { labelKeys } from './keys';

export const sheetLayoutsQueryOptions = () =>
  queryOptions({
    queryKey: labelKeys.layouts(),
    queryFn: async () => (await api.get<{ data: SheetLayoutDto[] }>('/api/labels/layouts')).data,
    staleTime: Infinity,
  });
