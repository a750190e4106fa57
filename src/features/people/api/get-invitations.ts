import { queryOptions } from '@tanstack/react-query';
import type { PendingInvitation } from '@shared/schemas/people';
import { api } from '@/lib/api-client';
import { peopleKeys } from './keys';

export const invitationsQueryOptions = () =>
  queryOptions({
    queryKey: peopleKeys.invitations(),
    queryFn: async () => (await api.get<{ data: PendingInvitation[] }>('/api/invitations')).data,
  });
