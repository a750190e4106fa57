import type { QueryClient, QueryKey } from '@tanstack/react-query';
import { useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { lazy, Suspense, useCallback } from 'react';
import { Outlet, useLocation, useNavigate, type LoaderFunctionArgs } from 'react-router';
import { ROLE_LABELS } from '@shared/roles';
import type { QueuedActionKind } from '@shared/schemas/offline';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { useLogout } from '@/features/auth/api/logout';
import { MainLandmark } from '@/components/ui/main-landmark';
import type { QueuedAction } from '@/features/offline/db';
import { refreshShown, shownOn } from '@/lib/query-keys';
import { messageOf } from '@/lib/errors';
import { requireSignedIn } from './guards';
import { currentLink, linksFor } from './nav-links';
import { PhoneNav } from './phone-nav';
import { SideNav } from './side-nav';

// The offline copy and queue (IndexedDB through Dexie) load just after the first render, outside the
// first-load budget: nothing is queued before the page exists.
const OfflineBanner = lazy(() => import('@/features/offline/components/offline-banner').then((m) => ({ default: m.OfflineBanner })));
const OfflineSync = lazy(() => import('@/features/offline/components/offline-sync').then((m) => ({ default: m.OfflineSync })));

export const appShellLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await requireSignedIn(queryClient, request);
  return null;
};

/** What each queued action shows on: the same as the online mutation that does it. */
const QUEUED_SHOWN_ON: Record<QueuedActionKind, readonly QueryKey[]> = {
  check_out: shownOn.toolState,
  return: shownOn.toolState,
  draw: shownOn.stockMovement,
  return_unused: shownOn.stockMovement,
};

/** A queued action reached the server (or was refused): refresh what it changes. */
function useRefreshAfterQueue() {
  const queryClient = useQueryClient();
  return useCallback((entry: QueuedAction) => void refreshShown(queryClient, QUEUED_SHOWN_ON[entry.kind]), [queryClient]);
}

/**
 * The pages a scan walks through load with their route, but a phone that loses the Wi-Fi before it
 * opened them (and before the service worker has taken over) could not open them offline: the
 * offline sync fetches them before it takes the catalogue copy, so a copy on the phone means a scan
 * opens from it.
 */
async function preloadScanPages(): Promise<void> {
  await Promise.all([import('./scan'), import('./tool-detail'), import('./bin-detail'), import('./queue')]);
}

export function AppShell() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const logout = useLogout();
  const navigate = useNavigate();
  const refreshAfterQueue = useRefreshAfterQueue();
  const { pathname } = useLocation();
  if (!me) return null;
  const links = linksFor(me.role);
  const current = currentLink(links, pathname);

  const signOut = () =>
    logout.mutate(undefined, {
      onSuccess: () => {
        void import('@/features/offline/api/sign-out').then(async ({ forgetOnSignOut }) => {
          const waiting = await forgetOnSignOut(me.id);
          if (waiting === 0) return;
          const words = `${waiting === 1 ? '1 action waits' : `${waiting} actions wait`} on this phone: sign in here again to send them.`;
          // sonner stays out of the first load (see app/provider.tsx).
          void import('sonner').then(({ toast }) => toast.info(words));
        });
        void navigate('/sign-in', { replace: true });
      },
      onError: (err) => void import('sonner').then(({ toast }) => toast.error(messageOf(err))),
    });

  return (
    <div className="min-h-dvh pb-20 md:pb-0">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:p-3">
        Skip to content
      </a>
      <header className="border-b border-rule bg-ink text-card">
        <div className="mx-auto flex max-w-7xl items-center justify-between gap-3 px-4 py-2">
          <div className="min-w-0 flex-1">
            <p className="font-mono text-sm font-medium tracking-widest text-brass uppercase">Gripline</p>
            <p className="truncate text-sm text-card/80">
              {me.name} · {ROLE_LABELS[me.role]}
            </p>
          </div>
          <button
            type="button"
            onClick={signOut}
            disabled={logout.isPending}
            className="min-h-12 shrink-0 rounded-lg border-2 border-card/60 px-3 font-semibold whitespace-nowrap hover:bg-ink-soft"
          >
            Sign out
          </button>
        </div>
        {/* Inside the header landmark, under the name: quiet, but the first thing read. */}
        <Suspense fallback={null}>
          <OfflineBanner memberId={me.id} />
        </Suspense>
      </header>
      <Suspense fallback={null}>
        <OfflineSync memberId={me.id} onSettled={refreshAfterQueue} prepare={preloadScanPages} />
      </Suspense>
      <div className="mx-auto flex max-w-7xl md:gap-6 md:px-4">
        <SideNav links={links} current={current} />
        <MainLandmark id="main" className="min-w-0 flex-1 px-4 py-5 md:px-0">
          <Outlet />
        </MainLandmark>
      </div>
      <PhoneNav links={links} current={current} />
    </div>
  );
}
