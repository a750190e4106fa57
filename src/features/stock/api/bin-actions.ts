import { useMutation } from '@tanstack/react-query';
import type { CountBody, CountResult, DrawBody, MoveBody, Movement, ReceiveBody, ReturnUnusedBody, ReverseBody, WriteOffBody } from '@shared/schemas/bins';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

const path = (code: string, rest: string) => `/api/bins/${encodeURIComponent(code)}/${rest}`;

/** An empty note is no note: leave it out of the body rather than write "" to the ledger. */
function withoutEmptyNote<T extends { note?: string }>(body: T): T {
  return body.note?.trim() ? body : { ...body, note: undefined };
}

/**
 * A movement changes the bin's on-hand and ledger (a move changes two bins), what to order, the
 * tab it is charged to and the bill of the assembly it is for: every screen showing one refreshes.
 */
function useStockMutation<B extends { note?: string }, R>(rest: string) {
  return useMutation({
    mutationFn: ({ code, body }: { code: string; body: B }) => api.post<R>(path(code, rest), withoutEmptyNote(body)),
    meta: { invalidates: shownOn.stockMovement },
  });
}

export const useDraw = () => useStockMutation<DrawBody, Movement>('draw');
export const useReturnUnused = () => useStockMutation<ReturnUnusedBody, Movement>('return');
export const useReceive = () => useStockMutation<ReceiveBody, Movement>('receive');
export const useCount = () => useStockMutation<CountBody, CountResult>('count');
export const useMove = () => useStockMutation<MoveBody, Movement>('move');
export const useWriteOff = () => useStockMutation<WriteOffBody, Movement>('write-off');

export function useReverse() {
  return useMutation({
    mutationFn: ({ code, id, body }: { code: string; id: number; body: ReverseBody }) => api.post<Movement>(path(code, `ledger/${id}/reverse`), body),
    meta: { invalidates: shownOn.stockMovement },
  });
}
