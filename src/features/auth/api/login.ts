import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LoginBody, LoginResponse, User } from '@shared/schemas/auth';
import { api, setCsrfToken } from '@/lib/api-client';
import { setChapterTimeZone } from '@/lib/chapter-zone';
import { authKeys } from './keys';

export async function login(body: LoginBody): Promise<User> {
  const res = await api.post<LoginResponse>('/api/auth/login', body);
  setCsrfToken(res.csrfToken);
  setChapterTimeZone(res.timeZone);
  return res.user;
}

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
