import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CribSettingsView, UpdateCribSettingsBody } from '@shared/schemas/signoffs';
import { api } from '@/lib/api-client';
import { setChapterTimeZone } from '@/lib/chapter-zone';
import { shownOn } from '@/lib/query-keys';
import { cribSettingsKeys } from './keys';

export function useUpdateCribSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateCribSettingsBody) => api.patch<CribSettingsView>('/api/settings/crib', body),
    onSuccess: (saved) => {
      setChapterTimeZone(saved.timeZone);
      queryClient.setQueryData(cribSettingsKeys.all, saved);
    },
    meta: { invalidates: shownOn.chapterSettings },
  });
}
