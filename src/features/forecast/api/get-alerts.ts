import { queryOptions } from '@tanstack/react-query';
import type { Alert, AlertState } from '@shared/schemas/forecast';
import { api } from '@/lib/api-client';
import { alertKeys } from './keys';

/** The filters the Alerts page offers: what still needs doing, what came in, what was set aside, or everything. */
export const ALERT_FILTERS = [
  { value: 'active', label: 'To order and on order' },
  { value: 'closed', label: 'Closed' },
  { value: 'dismissed', label: 'Dismissed' },
  { value: 'all', label: 'All alerts' },
] as const satisfies readonly { value: 'active' | 'all' | AlertState; label: string }[];
export type AlertListState = (typeof ALERT_FILTERS)[number]['value'];

export const alertFilter = (raw: string | null): AlertListState => ALERT_FILTERS.find((f) => f.value === raw)?.value ?? 'active';

export const alertsQueryOptions = (state: AlertListState) =>
  queryOptions({
    queryKey: alertKeys.list(state),
    queryFn: async () => (await api.get<{ data: Alert[] }>(`/api/alerts?state=${state}`)).data,
  });
