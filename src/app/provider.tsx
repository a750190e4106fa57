import { MutationCache, QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { lazy, Suspense, type ReactNode } from 'react';
import { ApiError } from '@/lib/api-client';
import { refreshShown } from '@/lib/query-keys';

/** Retries only what a flaky hangar network can explain: no connection or a server hiccup. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status > 0 && error.status < 500) return false;
  return failureCount < 3;
}

/**
 * One place turns a mutation's declared `meta.invalidates` into refreshed screens (see shownOn in
 * lib/query-keys.ts). On settle, not only success: a refusal (the bin ran empty, the tool went out
 * meanwhile) or a lost answer to a change the server made means the screen is out of date too.
 * The mutation resolves after the refresh, so a caller that awaits it sees the new figures.
 */
export function createQueryClient(): QueryClient {
  const queryClient: QueryClient = new QueryClient({
    mutationCache: new MutationCache({
      onSettled: (_data, _error, _variables, _onMutateResult, mutation) => refreshShown(queryClient, mutation.meta?.invalidates ?? []),
    }),
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 15_000, refetchOnWindowFocus: true },
      mutations: { retry: false },
    },
  });
  return queryClient;
}

/**
 * The toast host loads after the first render, outside the first-load budget; a toast raised before
 * it mounts is shown once it does (sonner replays them).
 */
const Toaster = lazy(() => import('sonner').then(({ Toaster }) => ({ default: Toaster })));

/** On a phone toasts sit above the bottom bar (3.5 rem) and never cover the header or the bar. */
const TOASTS_ABOVE_NAV = { bottom: 'calc(4.5rem + env(safe-area-inset-bottom))' };

export function AppProvider({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      {children}
      <Suspense fallback={null}>
        <Toaster position="bottom-center" mobileOffset={TOASTS_ABOVE_NAV} richColors closeButton toastOptions={{ className: 'text-base' }} />
      </Suspense>
    </QueryClientProvider>
  );
}
