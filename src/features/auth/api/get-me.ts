import { queryOptions } from '@tanstack/react-query';
import type { User } from '@shared/schemas/auth';
import { api, ApiError } from '@/lib/api-client';
import { authKeys } from './keys';

/** The signed-in person, or null when signed out. */
export async function getMe(): Promise<User | null> {
  try {
    return (await api.getOrGiveUp<{ user: User }>('/api/auth/me')).user;
  } catch (err) {
    if (err instanceof ApiError && err.status === 401) return null;
    throw err;
  }
}

export const meQueryOptions = () =>
  queryOptions({ queryKey: authKeys.me(), queryFn: getMe, staleTime: 60_000 });
