import { queryOptions } from '@tanstack/react-query';
import type { ServiceDueList } from '@shared/schemas/overdue';
import { api } from '@/lib/api-client';
import { serviceKeys } from './keys';

export const serviceDueQueryOptions = () =>
  queryOptions({
    queryKey: serviceKeys.due(),
    queryFn: () => api.get<ServiceDueList>('/api/service-due'),
  });
