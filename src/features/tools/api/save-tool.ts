import { useMutation } from '@tanstack/react-query';
import type { CreateToolBody, Tool, UpdateToolBody } from '@shared/schemas/tools';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useCreateTool() {
  return useMutation({
    mutationFn: (body: CreateToolBody) => api.post<Tool>('/api/tools', body),
    meta: { invalidates: shownOn.toolSpec },
  });
}

export function useEditTool(code: string) {
  return useMutation({
    mutationFn: (change: UpdateToolBody) => api.patch<Tool>(`/api/tools/${encodeURIComponent(code)}`, change),
    meta: { invalidates: shownOn.toolSpec },
  });
}
