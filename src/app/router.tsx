import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter } from 'react-router';
import { AppShell, appShellLoader } from './routes/app/app-shell';
import { BinDetailRoute, binDetailLoader } from './routes/app/bin-detail';
import { BinsRoute, binsLoader } from './routes/app/bins';
import { HomeRoute } from './routes/app/home';
import { LoansRoute, loansLoader } from './routes/app/loans';
import { QueueRoute } from './routes/app/queue';
import { ScanRoute } from './routes/app/scan';
import { ToolDetailRoute, toolDetailLoader } from './routes/app/tool-detail';
import { ToolsRoute, toolsLoader } from './routes/app/tools';
import { AcceptInvitationRoute } from './routes/auth/accept-invitation';
import { ResetPasswordConfirmRoute, ResetPasswordRequestRoute } from './routes/auth/reset-password';
import { SignInRoute, signInLoader } from './routes/auth/sign-in';
import { LoadingRoute, NotFoundRoute, RouteError } from './routes/route-error';

/**
 * A data router: loaders fill the query cache, components read the same queries. Pages members
 * rarely or never open load lazily, so a phone downloads first what a member uses.
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
        { path: 'scan', Component: ScanRoute },
        { path: 'queue', Component: QueueRoute },
        { path: 'tools', loader: toolsLoader(queryClient), Component: ToolsRoute, ErrorBoundary: RouteError },
        {
          path: 'tools/new',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { ToolNewRoute, toolNewLoader } = await import('./routes/app/tool-edit');
            return { loader: toolNewLoader(queryClient), Component: ToolNewRoute };
          },
        },
        { path: 'tools/:code', loader: toolDetailLoader(queryClient), Component: ToolDetailRoute, ErrorBoundary: RouteError },
        {
          path: 'tools/:code/edit',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { ToolEditRoute, toolEditLoader } = await import('./routes/app/tool-edit');
            return { loader: toolEditLoader(queryClient), Component: ToolEditRoute };
          },
        },
        { path: 'loans', loader: loansLoader(queryClient), Component: LoansRoute, ErrorBoundary: RouteError },
        { path: 'bins', loader: binsLoader(queryClient), Component: BinsRoute, ErrorBoundary: RouteError },
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
        { path: 'bins/:code', loader: binDetailLoader(queryClient), Component: BinDetailRoute, ErrorBoundary: RouteError },
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
          path: 'settings/planning',
          ErrorBoundary: RouteError,
          lazy: async () => {
            const { PlanningSettingsRoute, planningSettingsLoader } = await import('./routes/app/planning-settings');
            return { loader: planningSettingsLoader(queryClient), Component: PlanningSettingsRoute };
          },
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
  ]);
}
