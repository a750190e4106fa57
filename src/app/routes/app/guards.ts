import type { EnsureQueryDataOptions, QueryClient } from '@tanstack/react-query';
import { data, redirect, type LoaderFunctionArgs } from 'react-router';
import { hasRole, ROLE_LABELS, type Role } from '@shared/roles';
import type { User } from '@shared/schemas/auth';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { isNoConnection } from '@/lib/api-client';

/**
 * With no network and nobody in memory (the installed app opened in airplane mode), the person
 * whose offline copy the phone keeps is taken as signed in, so scans open from the copy.
 */
async function personFromOfflineCopy(queryClient: QueryClient): Promise<User | undefined> {
  // Dexie loads only here, when it is needed, not with the first page.
  const you = await import('@/features/offline/api/catalogue').then(({ offlineMember }) => offlineMember()).catch(() => undefined);
  if (!you) return undefined;
  const user: User = { id: you.id, name: you.name, role: you.role, email: '' };
  queryClient.setQueryData(meQueryOptions().queryKey, user);
  return user;
}

async function signedInPerson(queryClient: QueryClient): Promise<User | null> {
  const known = queryClient.getQueryData(meQueryOptions().queryKey);
  if (known !== undefined) return known;
  // A query would wait for the network to come back; the copy answers now.
  if (!navigator.onLine) {
    const offline = await personFromOfflineCopy(queryClient);
    if (offline) return offline;
  }
  try {
    return await queryClient.ensureQueryData(meQueryOptions());
  } catch (err) {
    const offline = isNoConnection(err) ? await personFromOfflineCopy(queryClient) : undefined;
    if (offline) return offline;
    throw err;
  }
}

/** The signed-in person, or a redirect to sign-in that comes back here afterwards. */
export async function requireSignedIn(queryClient: QueryClient, request: Request): Promise<User> {
  const me = await signedInPerson(queryClient);
  if (!me) {
    const url = new URL(request.url);
    throw redirect(`/sign-in?next=${encodeURIComponent(url.pathname + url.search)}`);
  }
  return me;
}

export async function requireRole(queryClient: QueryClient, request: Request, role: Role): Promise<User> {
  const me = await requireSignedIn(queryClient, request);
  if (!hasRole(me.role, role)) {
    throw data({ message: `Only a ${ROLE_LABELS[role].toLowerCase()} can open this page.` }, { status: 403 });
  }
  return me;
}

/**
 * Runs a page's guard and its data requests at once, so a cold load waits for one round trip, not two.
 * When the guard refuses (signed out: the redirect to sign-in; the wrong role: the 403), its answer
 * wins over a data request the server refused meanwhile; otherwise a failed data request is the page's
 * error. Data that depends on who is signed in starts from the guard: `guard.then((me) => …)`.
 */
export async function loadAlongside<T>(guard: Promise<User>, data: Promise<T>): Promise<T> {
  const loaded = data.then(
    (value) => ({ value }),
    (error: unknown) => ({ error }),
  );
  await guard;
  const result = await loaded;
  if ('error' in result) throw result.error;
  return result.value;
}

/** Any query a page fills before it shows (its data type does not matter to the loader). */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- one list holds queries of every data type
type PageQuery = EnsureQueryDataOptions<any, Error, any, any>;

/**
 * The loader of a page that needs only a guard and a fixed set of queries: who may open it
 * ('signed-in' for anyone signed in, or the least role), and the queries, all started with the guard.
 */
export function pageLoader(who: Role | 'signed-in', queries: readonly PageQuery[]) {
  return (queryClient: QueryClient) =>
    async ({ request }: LoaderFunctionArgs) => {
      const guard = who === 'signed-in' ? requireSignedIn(queryClient, request) : requireRole(queryClient, request, who);
      await loadAlongside(guard, Promise.all(queries.map((query) => queryClient.ensureQueryData(query))));
      return null;
    };
}
