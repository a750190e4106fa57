import { queryOptions } from '@tanstack/react-query';
import type { ForecastList } from '@shared/schemas/forecast';
import { api } from '@/lib/api-client';
import { forecastKeys } from './keys';

/** Every bin's next 26 weeks (quartermaster and lead). */
export const forecastQueryOptions = () =>
  queryOptions({
    queryKey: forecastKeys.list(),
    queryFn: () => api.get<ForecastList>('/api/forecast'),
  });
