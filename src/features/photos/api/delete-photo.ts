import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function useDeletePhoto() {
  return useMutation({ mutationFn: (id: number) => api.delete(`/api/photos/${id}`) });
}
