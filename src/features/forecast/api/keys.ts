import { REORDER_ROOTS } from '@/lib/reorder-queries';
import type { AlertListState } from './get-alerts';

/** Forecast, alerts and the chapter's planning settings: one family, so an order marked refreshes the forecast too. */
export const forecastKeys = {
  all: REORDER_ROOTS.forecast,
  list: () => ['forecast', 'list'] as const,
};

export const alertKeys = {
  all: REORDER_ROOTS.alerts,
  lists: () => ['alerts', 'list'] as const,
  list: (state: AlertListState) => ['alerts', 'list', state] as const,
  purchaseList: () => ['alerts', 'purchase-list'] as const,
};

export const planningKeys = {
  settings: () => ['planning-settings'] as const,
  waste: () => ['planning-settings', 'waste'] as const,
};
