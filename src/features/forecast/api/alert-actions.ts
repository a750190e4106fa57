import { useMutation } from '@tanstack/react-query';
import type { Alert, MarkOrderedBody } from '@shared/schemas/forecast';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

/**
 * An alert's state moves the alert lists, the purchase list, the forecast (an order is an expected
 * receipt) and the bins (on order, to order, the Restock list).
 */
function useAlertMutation<V, R>(send: (v: V) => Promise<R>) {
  return useMutation({ mutationFn: send, meta: { invalidates: shownOn.alertState } });
}

export const useMarkOrdered = () =>
  useAlertMutation(({ id, body }: { id: number; body: MarkOrderedBody }) =>
    api.post<Alert>(`/api/alerts/${id}/ordered`, body.note?.trim() ? body : { ...body, note: undefined }),
  );

/** An ordered alert whose rest will not come: closed by hand, nothing stays on order. */
export const useCloseAlert = () => useAlertMutation(({ id }: { id: number }) => api.post<Alert>(`/api/alerts/${id}/close`));

export const useDismissAlert = () => useAlertMutation(({ id, reason }: { id: number; reason: string }) => api.post<Alert>(`/api/alerts/${id}/dismiss`, { reason }));

export interface RefreshResult {
  /** New alerts raised by this check. */
  raised: number;
  data: Alert[];
}

/** Runs the check the daily job runs, now. */
export const useRefreshAlerts = () => useAlertMutation(() => api.post<RefreshResult>('/api/alerts/refresh'));
