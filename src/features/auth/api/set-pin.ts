import { useMutation } from '@tanstack/react-query';
import type { SetPinBody } from '@shared/schemas/stations';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

/** Sets or changes the signed-in person's own station PIN. */
export function useSetPin() {
  return useMutation({
    mutationFn: (body: SetPinBody) => api.put<void>('/api/me/pin', body),
    meta: { invalidates: shownOn.person },
  });
}
