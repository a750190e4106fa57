import type { QueryClient } from '@tanstack/react-query';
import { redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { AuthLayout } from './auth-layout';

/** Only same-site paths are followed after sign-in. */
export function safeNext(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : '/';
}

export const signInLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me) return redirect(safeNext(new URL(request.url).searchParams.get('next')));
  return null;
};

export function SignInRoute() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  return (
    <AuthLayout title="Sign in">
      <SignInForm onSignedIn={() => navigate(safeNext(params.get('next')), { replace: true })} />
    </AuthLayout>
  );
}
