import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter } from 'react-router';
import { AppShell, appShellLoader } from './routes/app/app-shell';
import { HomeRoute } from './routes/app/home';
import { AcceptInvitationRoute } from './routes/auth/accept-invitation';
import { ResetPasswordConfirmRoute, ResetPasswordRequestRoute } from './routes/auth/reset-password';
import { SignInRoute, signInLoader } from './routes/auth/sign-in';
import { LoadingRoute, NotFoundRoute, RouteError } from './routes/route-error';

/**
 * A data router: loaders fill the query cache, components read the same queries. The lead's pages
 * load lazily, so a member's phone downloads only what a member uses.
 */
export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    { path: '/sign-in', loader: signInLoader(queryClient), Component: SignInRoute, ErrorBoundary: RouteError, HydrateFallback: LoadingRoute },
    { path: '/reset-password', Component: ResetPasswordRequestRoute },
    { path: '/reset-password/:token', Component: ResetPasswordConfirmRoute },
    { path: '/invite/:token', Component: AcceptInvitationRoute },
    {
      path: '/',
      loader: appShellLoader(queryClient),
      Component: AppShell,
      ErrorBoundary: RouteError,
      HydrateFallback: LoadingRoute,
      children: [
        { index: true, Component: HomeRoute },
        {
          path: 'people',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { PeopleRoute, peopleLoader } = await import('./routes/app/people');
            return { loader: peopleLoader(queryClient), Component: PeopleRoute };
          },
        },
        {
          path: 'mail',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { SentMailRoute, sentMailLoader } = await import('./routes/app/sent-mail');
            return { loader: sentMailLoader(queryClient), Component: SentMailRoute };
          },
        },
      ],
    },
    { path: '*', Component: NotFoundRoute },
  ]);
}
