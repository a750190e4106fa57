import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Build, CreateBuildBody } from '@shared/schemas/builds';
import { api } from '@/lib/api-client';
import { buildKeys } from './keys';

export function useCreateBuild() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateBuildBody) => api.post<Build>('/api/builds', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: buildKeys.all }),
  });
}
