import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import { createBrowserRouter, type LoaderFunction, type RouteObject } from 'react-router';
import { AppShell, appShellLoader } from './routes/app/app-shell';
import { HomeRoute } from './routes/app/home';
import { SignInRoute, signInLoader } from './routes/auth/sign-in';
import { LoadingRoute, NotFoundRoute, RouteError } from './routes/route-error';

/**
 * A data router: loaders fill the query cache, components read the same queries. Pages members
 * opens first (sign-in, and home inside the shell) are in the first download; every other page loads
 * with its own chunk when it is opened, so the first load stays within its budget
 * (tests/build/first-load-budget.test.ts).
 */
export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter(appRoutes(queryClient));
}

/** What a page's module gives the router: its component, and the loader that fills its queries. */
interface LazyPage {
  Component: ComponentType;
  loader?: (queryClient: QueryClient) => LoaderFunction;
}

/** Every page of the client, with its loader. */
export function appRoutes(queryClient: QueryClient): RouteObject[] {
  /** A page of the signed-in app that downloads with its own chunk when it is first opened. */
  const page = (path: string, load: () => Promise<LazyPage>): RouteObject => ({
    path,
    ErrorBoundary: RouteError,
    lazy: async () => {
      const { Component, loader } = await load();
      return loader ? { Component, loader: loader(queryClient) } : { Component };
    },
  });

  return [
    { path: '/sign-in', loader: signInLoader(queryClient), Component: SignInRoute, ErrorBoundary: RouteError, HydrateFallback: LoadingRoute },
    {
      path: '/reset-password',
      lazy: async () => ({ Component: (await import('./routes/auth/reset-password')).ResetPasswordRequestRoute }),
    },
    {
      path: '/reset-password/:token',
      lazy: async () => ({ Component: (await import('./routes/auth/reset-password')).ResetPasswordConfirmRoute }),
    },
    {
      // The crib station: full screen, outside the signed-in app, loaded only on a station.
      path: '/station',
      ErrorBoundary: RouteError,
      lazy: async () => ({ Component: (await import('./routes/station')).StationRoute }),
    },
    {
      path: '/invite/:token',
      lazy: async () => ({ Component: (await import('./routes/auth/accept-invitation')).AcceptInvitationRoute }),
    },
    {
      path: '/',
      loader: appShellLoader(queryClient),
      Component: AppShell,
      ErrorBoundary: RouteError,
      HydrateFallback: LoadingRoute,
      children: [
        { index: true, Component: HomeRoute },
        page('scan', () => import('./routes/app/scan').then((m) => ({ Component: m.ScanRoute }))),
        page('tools', () => import('./routes/app/tools').then((m) => ({ Component: m.ToolsRoute, loader: m.toolsLoader }))),
        page('queue', () => import('./routes/app/queue').then((m) => ({ Component: m.QueueRoute }))),
        page('tools/new', () => import('./routes/app/tool-edit').then((m) => ({ Component: m.ToolNewRoute, loader: m.toolNewLoader }))),
        page('tools/:code', () => import('./routes/app/tool-detail').then((m) => ({ Component: m.ToolDetailRoute, loader: m.toolDetailLoader }))),
        page('tools/:code/edit', () => import('./routes/app/tool-edit').then((m) => ({ Component: m.ToolEditRoute, loader: m.toolEditLoader }))),
        page('loans', () => import('./routes/app/loans').then((m) => ({ Component: m.LoansRoute, loader: m.loansLoader }))),
        page('bins', () => import('./routes/app/bins').then((m) => ({ Component: m.BinsRoute, loader: m.binsLoader }))),
        page('bins/import', () => import('./routes/app/bin-import').then((m) => ({ Component: m.BinImportRoute, loader: m.binImportLoader }))),
        page('bins/new', () => import('./routes/app/bin-edit').then((m) => ({ Component: m.BinNewRoute, loader: m.binNewLoader }))),
        page('bins/:code', () => import('./routes/app/bin-detail').then((m) => ({ Component: m.BinDetailRoute, loader: m.binDetailLoader }))),
        page('bins/:code/edit', () => import('./routes/app/bin-edit').then((m) => ({ Component: m.BinEditRoute, loader: m.binEditLoader }))),
        page('restock', () => import('./routes/app/restock').then((m) => ({ Component: m.RestockRoute, loader: m.restockLoader }))),
        page('tab', () => import('./routes/app/tab').then((m) => ({ Component: m.TabRoute, loader: m.tabLoader }))),
        page('spend', () => import('./routes/app/spend').then((m) => ({ Component: m.SpendRoute, loader: m.spendLoader }))),
        page('payments', () => import('./routes/app/payments').then((m) => ({ Component: m.PaymentsRoute, loader: m.paymentsLoader }))),
        page('overview', () => import('./routes/app/overview').then((m) => ({ Component: m.OverviewRoute, loader: m.overviewLoader }))),
        page('people', () => import('./routes/app/people').then((m) => ({ Component: m.PeopleRoute, loader: m.peopleLoader }))),
        page('mail', () => import('./routes/app/sent-mail').then((m) => ({ Component: m.SentMailRoute, loader: m.sentMailLoader }))),
        page('my-mail', () => import('./routes/app/my-mail').then((m) => ({ Component: m.MyMailRoute, loader: m.myMailLoader }))),
        page('overdue', () => import('./routes/app/overdue').then((m) => ({ Component: m.OverdueRoute, loader: m.overdueLoader }))),
        page('service', () => import('./routes/app/service').then((m) => ({ Component: m.ServiceRoute, loader: m.serviceLoader }))),
        page('signoffs', () => import('./routes/app/signoffs').then((m) => ({ Component: m.SignoffsRoute, loader: m.signoffsLoader }))),
        page('stations', () => import('./routes/app/stations').then((m) => ({ Component: m.StationsRoute, loader: m.stationsLoader }))),
        page('labels', () => import('./routes/app/labels').then((m) => ({ Component: m.LabelsRoute, loader: m.labelsLoader }))),
        page('alerts', () => import('./routes/app/alerts').then((m) => ({ Component: m.AlertsRoute, loader: m.alertsLoader }))),
        page('forecast', () => import('./routes/app/forecast').then((m) => ({ Component: m.ForecastRoute, loader: m.forecastLoader }))),
        page('settings', () => import('./routes/app/settings').then((m) => ({ Component: m.SettingsRoute, loader: m.settingsLoader }))),
        {
          path: 'settings/planning',
          lazy: async () => ({ loader: (await import('./routes/app/settings')).planningSettingsRedirect }),
        },
        page('builds', () => import('./routes/app/builds').then((m) => ({ Component: m.BuildsRoute, loader: m.buildsLoader }))),
        page('builds/:id/assemblies/new', () => import('./routes/app/assembly-edit').then((m) => ({ Component: m.AssemblyNewRoute, loader: m.assemblyNewLoader }))),
        page('assemblies/:id', () => import('./routes/app/assembly-detail').then((m) => ({ Component: m.AssemblyDetailRoute, loader: m.assemblyDetailLoader }))),
        page('assemblies/:id/edit', () => import('./routes/app/assembly-edit').then((m) => ({ Component: m.AssemblyEditRoute, loader: m.assemblyEditLoader }))),
      ],
    },
    { path: '*', Component: NotFoundRoute },
  ];
}
