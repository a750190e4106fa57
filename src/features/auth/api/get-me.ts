import { queryOptions } from '@tanstack/react-query';
import type { MeResponse, User } from '@shared/schemas/auth';
import { api, ApiError } from '@/lib/api-client';
import { setChapterTimeZone } from '@/lib/chapter-zone';
import { authKeys } from './keys';

/** The signed-in person, or null when signed out; the answer also says the chapter's time zone. */
export async function getMe(): Promise<User | null> {
  try {
    const me = await api.getOrGiveUp<MeResponse>('/api/auth/me');
    setChapterTimeZone(me.timeZone);
    return me.user;
  } catch (err) {
    // A session that ended on the server (the person was deactivated) still answers 401 once.
    if (err instanceof ApiError && err.status === 401) return null;
    throw err;
  }
}

export const meQueryOptions = () =>
  queryOptions({ queryKey: authKeys.me(), queryFn: getMe, staleTime: 60_000 });
