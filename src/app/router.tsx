import { createBrowserRouter, Navigate } from 'react-router-dom';
import { AppLayout } from '@/components/layout/app-layout';
import { ApiKeysPage } from './routes/api-keys/api-keys';
import { AcceptInvitePage } from './routes/auth/accept-invite';
import { BenchPage } from './routes/bench/bench';
import { CatalogPage } from './routes/catalog/catalog';
import { ComparePage } from './routes/compare/compare';
import { FitReportPage } from './routes/fit-reports/fit-report';
import { FitReportsPage } from './routes/fit-reports/fit-reports';
import { JobsPage } from './routes/jobs/jobs';
import { TransfersPage } from './routes/transfers/transfers';
import { SettingsPage } from './routes/settings/settings';
import { SharedFitReportPage } from './routes/shared/shared-fit-report';
import { SignInPage } from './routes/auth/sign-in';
import { CounterPage } from './routes/counter/counter';
import { NotFoundPage } from './routes/not-found';
import { OutboxPage } from './routes/outbox/outbox';
import { PriceListsPage } from './routes/price-lists/price-lists';
import { SuppliersPage } from './routes/suppliers/suppliers';
import { TeamPage } from './routes/team/team';

export const router = createBrowserRouter([
  { path: '/sign-in', element: <SignInPage /> },
  { path: '/accept-invite', element: <AcceptInvitePage /> },
  { path: '/shared/fit-reports/:token', element: <SharedFitReportPage /> },
  {
    path: '/',
    element: <AppLayout />,
    children: [
      { index: true, element: <Navigate to="/counter" replace /> },
      { path: 'counter', element: <CounterPage /> },
      { path: 'compare', element: <ComparePage /> },
      { path: 'bench', element: <BenchPage /> },
      { path: 'fit-reports', element: <FitReportsPage /> },
      { path: 'fit-reports/:id', element: <FitReportPage /> },
      { path: 'settings', element: <SettingsPage /> },
      { path: 'price-lists', element: <PriceListsPage /> },
      { path: 'suppliers', element: <SuppliersPage /> },
      { path: 'catalog', element: <CatalogPage /> },
      { path: 'team', element: <TeamPage /> },
      { path: 'outbox', element: <OutboxPage /> },
      { path: 'jobs', element: <JobsPage /> },
      { path: 'transfers', element: <TransfersPage /> },
      { path: 'api-keys', element: <ApiKeysPage /> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);
