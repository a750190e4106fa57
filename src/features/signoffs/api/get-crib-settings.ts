import { queryOptions } from '@tanstack/react-query';
import type { CribSettingsView } from '@shared/schemas/signoffs';
import { api } from '@/lib/api-client';
import { cribSettingsKeys } from './keys';

export const cribSettingsQueryOptions = () =>
  queryOptions({
    queryKey: cribSettingsKeys.all,
    queryFn: () => api.get<CribSettingsView>('/api/settings/crib'),
  });
