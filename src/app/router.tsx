import type { ComponentType } from 'react';
import { createBrowserRouter, Navigate, type LazyRouteFunction, type RouteObject } from 'react-router-dom';
import { AppLayout } from '@/components/layout/app-layout';
import { RouteError } from './route-error';

/**
 * Every page is its own chunk, fetched when its route is first visited: the first load carries the
 * shell alone, and charts, the buyer's and the admin's pages come only to those who open them.
 */
const page =
  <K extends string, M extends Record<K, ComponentType>>(load: () => Promise<M>, name: K): LazyRouteFunction<RouteObject> =>
  async () => ({ Component: (await load())[name] });

export const router = createBrowserRouter([
  {
    errorElement: <RouteError />,
    children: [
      { path: '/sign-in', lazy: page(() => import('./routes/auth/sign-in'), 'SignInPage') },
      { path: '/accept-invite', lazy: page(() => import('./routes/auth/accept-invite'), 'AcceptInvitePage') },
      { path: '/shared/fit-reports/:token', lazy: page(() => import('./routes/shared/shared-fit-report'), 'SharedFitReportPage') },
      {
        path: '/',
        element: <AppLayout />,
        children: [
          { index: true, element: <Navigate to="/counter" replace /> },
          { path: 'counter', lazy: page(() => import('./routes/counter/counter'), 'CounterPage') },
          { path: 'compare', lazy: page(() => import('./routes/compare/compare'), 'ComparePage') },
          { path: 'bench', lazy: page(() => import('./routes/bench/bench'), 'BenchPage') },
          { path: 'fit-reports', lazy: page(() => import('./routes/fit-reports/fit-reports'), 'FitReportsPage') },
          { path: 'fit-reports/:id', lazy: page(() => import('./routes/fit-reports/fit-report'), 'FitReportPage') },
          { path: 'settings', lazy: page(() => import('./routes/settings/settings'), 'SettingsPage') },
          { path: 'price-lists', lazy: page(() => import('./routes/price-lists/price-lists'), 'PriceListsPage') },
          { path: 'suppliers', lazy: page(() => import('./routes/suppliers/suppliers'), 'SuppliersPage') },
          { path: 'catalog', lazy: page(() => import('./routes/catalog/catalog'), 'CatalogPage') },
          { path: 'stores', lazy: page(() => import('./routes/stores/stores'), 'StoresPage') },
          { path: 'team', lazy: page(() => import('./routes/team/team'), 'TeamPage') },
          { path: 'outbox', lazy: page(() => import('./routes/outbox/outbox'), 'OutboxPage') },
          { path: 'jobs', lazy: page(() => import('./routes/jobs/jobs'), 'JobsPage') },
          { path: 'transfers', lazy: page(() => import('./routes/transfers/transfers'), 'TransfersPage') },
          { path: 'api-keys', lazy: page(() => import('./routes/api-keys/api-keys'), 'ApiKeysPage') },
          { path: '*', lazy: page(() => import('./routes/not-found'), 'NotFoundPage') },
        ],
      },
    ],
  },
]);
