import { useMutation } from '@tanstack/react-query';
import type { ResetConfirmBody, ResetRequestBody } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

interface Ack {
  ok: true;
  message: string;
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: (body: ResetRequestBody) => api.post<Ack>('/api/auth/password-reset', body) });
}

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: (body: ResetConfirmBody) => api.post<Ack>('/api/auth/password-reset/confirm', body) });
}
