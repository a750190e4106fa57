import { useMutation } from '@tanstack/react-query';
import type { Build, CreateBuildBody } from '@shared/schemas/builds';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export function useCreateBuild() {
  return useMutation({
    mutationFn: (body: CreateBuildBody) => api.post<Build>('/api/builds', body),
    meta: { invalidates: shownOn.builds },
  });
}
