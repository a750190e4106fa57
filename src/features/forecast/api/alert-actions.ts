import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Alert, MarkOrderedBody } from '@shared/schemas/forecast';
import { api } from '@/lib/api-client';
import { alertKeys, forecastKeys } from './keys';

/** An alert's state moves the alert lists, the purchase list and the forecast (an order is an expected receipt). */
function useAlertMutation<V, R>(send: (v: V) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSettled: () =>
      Promise.all([queryClient.invalidateQueries({ queryKey: alertKeys.all }), queryClient.invalidateQueries({ queryKey: forecastKeys.all })]),
  });
}

export const useMarkOrdered = () =>
  useAlertMutation(({ id, body }: { id: number; body: MarkOrderedBody }) =>
    api.post<Alert>(`/api/alerts/${id}/ordered`, body.note?.trim() ? body : { ...body, note: undefined }),
  );

export const useDismissAlert = () => useAlertMutation(({ id, reason }: { id: number; reason: string }) => api.post<Alert>(`/api/alerts/${id}/dismiss`, { reason }));

export interface RefreshResult {
  /** New alerts raised by this check. */
  raised: number;
  data: Alert[];
}

/** Runs the check the daily job runs, now. */
export const useRefreshAlerts = () => useAlertMutation(() => api.post<RefreshResult>('/api/alerts/refresh'));
