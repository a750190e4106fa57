import { queryOptions, useMutation } from '@tanstack/react-query';
import type { EnrolledStation, EnrolStationBody, Station } from '@shared/schemas/stations';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';
import { stationKeys } from './keys';

/** Every station enrolled, revoked ones included (quartermaster and lead). */
export const stationsQueryOptions = () =>
  queryOptions({
    queryKey: stationKeys.list(),
    queryFn: async () => (await api.get<{ data: Station[] }>('/api/stations')).data,
  });

/** Enrols this browser as a station; the token in the answer is shown once. */
export function useEnrolStation() {
  return useMutation({
    mutationFn: (body: EnrolStationBody) => api.post<EnrolledStation>('/api/stations', body),
    meta: { invalidates: shownOn.stations },
  });
}

export function useRevokeStation() {
  return useMutation({
    mutationFn: (id: number) => api.post<Station>(`/api/stations/${id}/revoke`),
    meta: { invalidates: shownOn.stations },
  });
}
