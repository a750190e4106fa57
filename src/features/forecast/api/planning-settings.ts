import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { ActualWaste, PlanningSettingsDto } from '@shared/schemas/forecast';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';
import { planningKeys } from './keys';

export const planningSettingsQueryOptions = () =>
  queryOptions({
    queryKey: planningKeys.settings(),
    queryFn: () => api.get<PlanningSettingsDto>('/api/settings/planning'),
  });

/** Waste measured on finished assemblies (drawn − estimated). */
export const actualWasteQueryOptions = () =>
  queryOptions({
    queryKey: planningKeys.waste(),
    queryFn: () => api.get<ActualWaste>('/api/waste'),
  });

/** The lead changes one or more settings; the forecast depends on the service level and costs. */
export function useUpdatePlanningSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Partial<PlanningSettingsDto>) => api.patch<PlanningSettingsDto>('/api/settings/planning', body),
    onSuccess: (saved) => queryClient.setQueryData(planningKeys.settings(), saved),
    meta: { invalidates: shownOn.planningSettings },
  });
}
