import { useMutation } from '@tanstack/react-query';
import type { CheckoutBody, ResolveAccessoryBody, ReturnBody } from '@shared/schemas/tools';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

const path = (code: string, rest: string) => `/api/tools/${encodeURIComponent(code)}/${rest}`;

/** Every action on a tool changes its state, its audit trail, someone's loans or holds, and the lists and kits that show them. */
function useToolMutation<V, R>(run: (vars: V) => Promise<R>) {
  return useMutation({
    mutationFn: run,
    meta: { invalidates: shownOn.toolState },
  });
}

export interface CheckoutResult {
  id: number;
  code: string;
  dueAt: string;
  accessories: string[];
}

export const useCheckOut = () =>
  useToolMutation(({ code, body }: { code: string; body: CheckoutBody }) => api.post<CheckoutResult>(path(code, 'checkout'), body));

export const useReturnTool = () =>
  useToolMutation(({ code, body }: { code: string; body: ReturnBody }) =>
    api.post<{ status: string; shortfall: number | null; accessoriesMissing: string[]; offeredTo: { name: string } | null }>(path(code, 'return'), body),
  );

/** The quartermaster marks an accessory that did not come back found or replaced. */
export const useResolveAccessory = () =>
  useToolMutation(({ code, body }: { code: string; body: ResolveAccessoryBody }) => api.post<{ data: unknown[] }>(path(code, 'missing-accessories/resolve'), body));

export const usePlaceHold = () => useToolMutation((code: string) => api.post<{ position: number }>(path(code, 'holds')));

export const useCancelHold = () => useToolMutation((code: string) => api.delete(path(code, 'holds/mine')));

export type StatusCommandPath = 'out-of-service' | 'back-in-service' | 'lost' | 'found' | 'retire';

export const useStatusCommand = () =>
  useToolMutation(({ code, command, note, serviced }: { code: string; command: StatusCommandPath; note: string; serviced?: boolean }) =>
    api.post<{ status: string }>(path(code, command), command === 'back-in-service' ? { note, serviced: serviced ?? false } : { note }),
  );
