import { createBrowserRouter, Navigate } from 'react-router-dom';
import { AppLayout } from '@/components/layout/app-layout';
import { AcceptInvitePage } from './routes/auth/accept-invite';
import { SignInPage } from './routes/auth/sign-in';
import { CounterPage } from './routes/counter/counter';
import { NotFoundPage } from './routes/not-found';
import { OutboxPage } from './routes/outbox/outbox';
import { TeamPage } from './routes/team/team';

export const router = createBrowserRouter([
  { path: '/sign-in', element: <SignInPage /> },
  { path: '/accept-invite', element: <AcceptInvitePage /> },
  {
    path: '/',
    element: <AppLayout />,
    children: [
      { index: true, element: <Navigate to="/counter" replace /> },
      { path: 'counter', element: <CounterPage /> },
      { path: 'team', element: <TeamPage /> },
      { path: 'outbox', element: <OutboxPage /> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);
