import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, type RouteObject } from 'react-router';
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

/** Every page of the client, with its loader. */
export function appRoutes(queryClient: QueryClient): RouteObject[] {
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
        {
          path: 'scan',
          ErrorBoundary: RouteError,
          lazy: async () => ({ Component: (await import('./routes/app/scan')).ScanRoute }),
        },
        {
          path: 'tools',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { ToolsRoute, toolsLoader } = await import('./routes/app/tools');
            return { loader: toolsLoader(queryClient), Component: ToolsRoute };
          },
        },
        {
          path: 'queue',
          ErrorBoundary: RouteError,
          lazy: async () => ({ Component: (await import('./routes/app/queue')).QueueRoute }),
        },
        {
          path: 'tools/new',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { ToolNewRoute, toolNewLoader } = await import('./routes/app/tool-edit');
            return { loader: toolNewLoader(queryClient), Component: ToolNewRoute };
          },
        },
        {
          path: 'tools/:code',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { ToolDetailRoute, toolDetailLoader } = await import('./routes/app/tool-detail');
            return { loader: toolDetailLoader(queryClient), Component: ToolDetailRoute };
          },
        },
        {
          path: 'tools/:code/edit',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { ToolEditRoute, toolEditLoader } = await import('./routes/app/tool-edit');
            return { loader: toolEditLoader(queryClient), Component: ToolEditRoute };
          },
        },
        {
          path: 'loans',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { LoansRoute, loansLoader } = await import('./routes/app/loans');
            return { loader: loansLoader(queryClient), Component: LoansRoute };
          },
        },
        {
          path: 'bins',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { BinsRoute, binsLoader } = await import('./routes/app/bins');
            return { loader: binsLoader(queryClient), Component: BinsRoute };
          },
        },
        {
          path: 'bins/import',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { BinImportRoute, binImportLoader } = await import('./routes/app/bin-import');
            return { loader: binImportLoader(queryClient), Component: BinImportRoute };
          },
        },
        {
          path: 'bins/new',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { BinNewRoute, binNewLoader } = await import('./routes/app/bin-edit');
            return { loader: binNewLoader(queryClient), Component: BinNewRoute };
          },
        },
        {
          path: 'bins/:code',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { BinDetailRoute, binDetailLoader } = await import('./routes/app/bin-detail');
            return { loader: binDetailLoader(queryClient), Component: BinDetailRoute };
          },
        },
        {
          path: 'bins/:code/edit',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { BinEditRoute, binEditLoader } = await import('./routes/app/bin-edit');
            return { loader: binEditLoader(queryClient), Component: BinEditRoute };
          },
        },
        {
          path: 'restock',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { RestockRoute, restockLoader } = await import('./routes/app/restock');
            return { loader: restockLoader(queryClient), Component: RestockRoute };
          },
        },
        {
          path: 'tab',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { TabRoute, tabLoader } = await import('./routes/app/tab');
            return { loader: tabLoader(queryClient), Component: TabRoute };
          },
        },
        {
          path: 'spend',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { SpendRoute, spendLoader } = await import('./routes/app/spend');
            return { loader: spendLoader(queryClient), Component: SpendRoute };
          },
        },
        {
          path: 'payments',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { PaymentsRoute, paymentsLoader } = await import('./routes/app/payments');
            return { loader: paymentsLoader(queryClient), Component: PaymentsRoute };
          },
        },
        {
          path: 'overview',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { OverviewRoute, overviewLoader } = await import('./routes/app/overview');
            return { loader: overviewLoader(queryClient), Component: OverviewRoute };
          },
        },
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
        {
          path: 'my-mail',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { MyMailRoute, myMailLoader } = await import('./routes/app/my-mail');
            return { loader: myMailLoader(queryClient), Component: MyMailRoute };
          },
        },
        {
          path: 'overdue',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { OverdueRoute, overdueLoader } = await import('./routes/app/overdue');
            return { loader: overdueLoader(queryClient), Component: OverdueRoute };
          },
        },
        {
          path: 'service',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { ServiceRoute, serviceLoader } = await import('./routes/app/service');
            return { loader: serviceLoader(queryClient), Component: ServiceRoute };
          },
        },
        {
          path: 'signoffs',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { SignoffsRoute, signoffsLoader } = await import('./routes/app/signoffs');
            return { loader: signoffsLoader(queryClient), Component: SignoffsRoute };
          },
        },
        {
          path: 'labels',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { LabelsRoute, labelsLoader } = await import('./routes/app/labels');
            return { loader: labelsLoader(queryClient), Component: LabelsRoute };
          },
        },
        {
          path: 'alerts',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { AlertsRoute, alertsLoader } = await import('./routes/app/alerts');
            return { loader: alertsLoader(queryClient), Component: AlertsRoute };
          },
        },
        {
          path: 'forecast',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { ForecastRoute, forecastLoader } = await import('./routes/app/forecast');
            return { loader: forecastLoader(queryClient), Component: ForecastRoute };
          },
        },
        {
          path: 'settings',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { SettingsRoute, settingsLoader } = await import('./routes/app/settings');
            return { loader: settingsLoader(queryClient), Component: SettingsRoute };
          },
        },
        {
          path: 'settings/planning',
          lazy: async () => ({ loader: (await import('./routes/app/settings')).planningSettingsRedirect }),
        },
        {
          path: 'builds',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { BuildsRoute, buildsLoader } = await import('./routes/app/builds');
            return { loader: buildsLoader(queryClient), Component: BuildsRoute };
          },
        },
        {
          path: 'builds/:id/assemblies/new',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { AssemblyNewRoute, assemblyNewLoader } = await import('./routes/app/assembly-edit');
            return { loader: assemblyNewLoader(queryClient), Component: AssemblyNewRoute };
          },
        },
        {
          path: 'assemblies/:id',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { AssemblyDetailRoute, assemblyDetailLoader } = await import('./routes/app/assembly-detail');
            return { loader: assemblyDetailLoader(queryClient), Component: AssemblyDetailRoute };
          },
        },
        {
          path: 'assemblies/:id/edit',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { AssemblyEditRoute, assemblyEditLoader } = await import('./routes/app/assembly-edit');
            return { loader: assemblyEditLoader(queryClient), Component: AssemblyEditRoute };
          },
        },
      ],
    },
    { path: '*', Component: NotFoundRoute },
  ];
}
