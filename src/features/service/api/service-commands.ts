import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

export type ServiceCommand = 'out-of-service' | 'back-in-service-serviced';

/** Takes a tool out for service, or brings it back serviced (which restarts its service interval). */
export function useServiceCommand() {
  return useMutation({
    mutationFn: ({ code, command, note }: { code: string; command: ServiceCommand; note: string }) =>
      command === 'out-of-service'
        ? api.post<{ status: string }>(`/api/tools/${encodeURIComponent(code)}/out-of-service`, { note })
        : api.post<{ status: string }>(`/api/tools/${encodeURIComponent(code)}/back-in-service`, { note, serviced: true }),
    meta: { invalidates: shownOn.toolState },
  });
}
