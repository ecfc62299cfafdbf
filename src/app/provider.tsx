import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { ApiError, setUnauthorizedHandler } from '@/lib/api-client';
import { authKeys } from '@/features/auth/api/keys';

export function AppProvider({ children }: { children: ReactNode }) {
  const [client] = useState(() => {
    const qc = new QueryClient({
      defaultOptions: {
        queries: {
          retry: (count, err) => !(err instanceof ApiError && err.status < 500) && count < 2,
          refetchOnWindowFocus: false,
        },
      },
    });
    // A lapsed session anywhere: forget the user, and the layout sends them to sign-in.
    setUnauthorizedHandler(() => qc.setQueryData(authKeys.me, null));
    return qc;
  });
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
