import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter } from 'react-router';
import { AppShell, appShellLoader } from './routes/app/app-shell';
import { HomeRoute } from './routes/app/home';
import { PeopleRoute, peopleLoader } from './routes/app/people';
import { SentMailRoute, sentMailLoader } from './routes/app/sent-mail';
import { AcceptInvitationRoute } from './routes/auth/accept-invitation';
import { ResetPasswordConfirmRoute, ResetPasswordRequestRoute } from './routes/auth/reset-password';
import { SignInRoute, signInLoader } from './routes/auth/sign-in';
import { NotFoundRoute, RouteError } from './routes/route-error';

/** A data router: loaders fill the query cache, components read the same queries. */
export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    { path: '/sign-in', loader: signInLoader(queryClient), Component: SignInRoute, ErrorBoundary: RouteError },
    { path: '/reset-password', Component: ResetPasswordRequestRoute },
    { path: '/reset-password/:token', Component: ResetPasswordConfirmRoute },
    { path: '/invite/:token', Component: AcceptInvitationRoute },
    {
      path: '/',
      loader: appShellLoader(queryClient),
      Component: AppShell,
      ErrorBoundary: RouteError,
      children: [
        { index: true, Component: HomeRoute },
        { path: 'people', loader: peopleLoader(queryClient), Component: PeopleRoute, ErrorBoundary: RouteError },
        { path: 'mail', loader: sentMailLoader(queryClient), Component: SentMailRoute, ErrorBoundary: RouteError },
      ],
    },
    { path: '*', Component: NotFoundRoute },
  ]);
}
