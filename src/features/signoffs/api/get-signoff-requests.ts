import { queryOptions } from '@tanstack/react-query';
import type { SignoffRequest } from '@shared/schemas/signoff-requests';
import { api } from '@/lib/api-client';
import { signoffKeys } from './keys';

/** Requests waiting for a lead, the oldest first. */
export const signoffRequestsQueryOptions = () =>
  queryOptions({
    queryKey: signoffKeys.requests(),
    queryFn: async () => (await api.get<{ data: SignoffRequest[] }>('/api/signoffs/requests')).data,
  });

/** The signed-in member's own requests, the newest first. */
export const mySignoffRequestsQueryOptions = () =>
  queryOptions({
    queryKey: signoffKeys.myRequests(),
    queryFn: async () => (await api.get<{ data: SignoffRequest[] }>('/api/signoffs/requests/mine')).data,
  });
