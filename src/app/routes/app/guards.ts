import type { QueryClient } from '@tanstack/react-query';
import { data, redirect } from 'react-router';
import { hasRole, ROLE_LABELS, type Role } from '@shared/roles';
import type { User } from '@shared/schemas/auth';
import { meQueryOptions } from '@/features/auth/api/get-me';

/** The signed-in person, or a redirect to sign-in that comes back here afterwards. */
export async function requireSignedIn(queryClient: QueryClient, request: Request): Promise<User> {
  const me = await queryClient.ensureQueryData(meQueryOptions());
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
