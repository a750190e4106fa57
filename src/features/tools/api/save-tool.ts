import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateToolBody, Tool, UpdateToolBody } from '@shared/schemas/tools';
import { api } from '@/lib/api-client';
import { toolKeys } from './keys';

export function useCreateTool() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateToolBody) => api.post<Tool>('/api/tools', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: toolKeys.all }),
  });
}

export function useEditTool(code: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: UpdateToolBody) => api.patch<Tool>(`/api/tools/${encodeURIComponent(code)}`, change),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: toolKeys.all }),
  });
}
