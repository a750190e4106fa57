import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { LengthUnit } from '@shared/schemas/builds';
import { api } from '@/lib/api-client';
import { preferenceKeys } from './keys';

interface Preferences {
  preferredUnit: LengthUnit;
}

/** The signed-in person's own settings: the unit new assemblies start in. */
export const preferencesQueryOptions = () =>
  queryOptions({
    queryKey: preferenceKeys.all,
    queryFn: () => api.get<Preferences>('/api/me/preferences'),
    staleTime: 5 * 60_000,
  });

export function useSetPreferredUnit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (preferredUnit: LengthUnit) => api.patch<Preferences>('/api/me/preferences', { preferredUnit }),
    onSuccess: (saved) => queryClient.setQueryData(preferenceKeys.all, saved),
  });
}
