import type { QueryClient } from '@tanstack/react-query';
import { useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { lazy, Suspense, useCallback } from 'react';
import { NavLink, Outlet, useNavigate, type LoaderFunctionArgs } from 'react-router';
import { hasRole, ROLE_LABELS, type Role } from '@shared/roles';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { useLogout } from '@/features/auth/api/logout';
import { MainLandmark } from '@/components/ui/main-landmark';
import type { QueuedAction } from '@/features/offline/db';
import { invalidateReorderFamily } from '@/lib/reorder-queries';
import { stockMoneyKeys } from '@/features/stock-money/api/keys';
import { toolKeys } from '@/features/tools/api/keys';
import { messageOf } from '@/lib/errors';
import { requireSignedIn } from './guards';

// The offline copy and queue (IndexedDB through Dexie) load just after the first render, outside the
// first-load budget: nothing is queued before the page exists.
const OfflineBanner = lazy(() => import('@/features/offline/components/offline-banner').then((m) => ({ default: m.OfflineBanner })));
const OfflineSync = lazy(() => import('@/features/offline/components/offline-sync').then((m) => ({ default: m.OfflineSync })));

export const appShellLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await requireSignedIn(queryClient, request);
  return null;
};

const LINK =
  'flex min-h-14 flex-1 flex-col items-center justify-center px-3 text-sm font-semibold sm:flex-none sm:min-h-12 sm:text-base aria-[current=page]:text-ink aria-[current=page]:shadow-[inset_0_-4px_0_var(--color-brass)] text-ink-soft';

/**
 * The sections of the app, each shown to the roles that may open it. On a phone the primary ones
 * sit in the bottom bar under the thumb; the rest are in the Menu at the top.
 */
const NAV_LINKS: { to: string; label: string; role: Role; primary?: boolean }[] = [
  { to: '/', label: 'Home', role: 'member', primary: true },
  { to: '/scan', label: 'Scan', role: 'member', primary: true },
  { to: '/tools', label: 'Tools', role: 'member', primary: true },
  { to: '/loans', label: 'My loans', role: 'member', primary: true },
  { to: '/bins', label: 'Bins', role: 'member' },
  { to: '/people', label: 'People', role: 'lead' },
  { to: '/mail', label: 'Sent mail', role: 'lead' },
  { to: '/overdue', label: 'Overdue', role: 'lead' },
  { to: '/service', label: 'Service', role: 'quartermaster' },
  { to: '/labels', label: 'Labels', role: 'quartermaster' },
  { to: '/restock', label: 'Restock', role: 'quartermaster' },
  { to: '/alerts', label: 'Reorder alerts', role: 'quartermaster' },
  { to: '/forecast', label: 'Forecast', role: 'quartermaster' },
  { to: '/builds', label: 'My builds', role: 'member' },
  { to: '/tab', label: 'My tab', role: 'member' },
  { to: '/my-mail', label: 'My mail', role: 'member' },
  { to: '/spend', label: 'Consumables', role: 'lead' },
  { to: '/signoffs', label: 'Sign-offs', role: 'lead' },
];

/** A queued action reached the server (or was refused): refresh what it changes. */
function useRefreshAfterQueue() {
  const queryClient = useQueryClient();
  return useCallback(
    (entry: QueuedAction) => {
      if (entry.kind === 'check_out' || entry.kind === 'return') {
        void queryClient.invalidateQueries({ queryKey: toolKeys.all });
      } else {
        void invalidateReorderFamily(queryClient);
        void queryClient.invalidateQueries({ queryKey: stockMoneyKeys.all });
      }
    },
    [queryClient],
  );
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
  if (!me) return null;
  const links = NAV_LINKS.filter((link) => hasRole(me.role, link.role));
  const more = links.filter((link) => !link.primary);

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
    <div className="min-h-dvh pb-20 sm:pb-0">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:p-3">
        Skip to content
      </a>
      <header className="border-b border-rule bg-ink text-card">
        <div className="mx-auto flex max-w-5xl items-center justify-between gap-3 px-4 py-2">
          <div className="min-w-0 flex-1">
            <p className="font-mono text-sm font-medium tracking-widest text-brass uppercase">Gripline</p>
            <p className="truncate text-sm text-card/80">
              {me.name} · {ROLE_LABELS[me.role]}
            </p>
          </div>
          {more.length > 0 && (
            <details className="relative sm:hidden">
              <summary className="flex min-h-12 cursor-pointer list-none items-center rounded-lg border-2 border-card/60 px-3 font-semibold whitespace-nowrap">Menu</summary>
              <ul className="absolute right-0 z-20 mt-2 w-56 rounded-xl border border-rule bg-card p-2 text-ink shadow-lg">
                {more.map((link) => (
                  <li key={link.to}>
                    <NavLink
                      to={link.to}
                      onClick={(e) => e.currentTarget.closest('details')?.removeAttribute('open')}
                      className="flex min-h-12 items-center rounded-lg px-3 font-semibold hover:bg-paper aria-[current=page]:bg-paper">
                      {link.label}
                    </NavLink>
                  </li>
                ))}
              </ul>
            </details>
          )}
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
      <nav aria-label="Main" className="fixed inset-x-0 bottom-0 z-10 border-t border-rule bg-card sm:static sm:border-t-0 sm:border-b">
        <div className="mx-auto flex max-w-5xl sm:flex-wrap sm:gap-1 sm:px-4">
          {links.map((link) => (
            <NavLink key={link.to} to={link.to} end={link.to === '/'} className={`${LINK} ${link.primary ? '' : 'max-sm:hidden'}`}>
              {link.label}
            </NavLink>
          ))}
        </div>
      </nav>
      <MainLandmark id="main" className="mx-auto max-w-5xl px-4 py-5">
        <Outlet />
      </MainLandmark>
    </div>
  );
}
