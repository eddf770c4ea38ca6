// The providers every page needs. A 401 anywhere marks the user as signed out;
// RequireAuth then sends them to sign-in with the address they were on.
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { forgetSession } from '../features/auth/api/forget-session';
import { SessionProvider } from '../features/auth/components/session-provider';
import { createQueryClient } from '../lib/query-client';

export function createAppQueryClient(): QueryClient {
  return createQueryClient({
    onUnauthenticated: forgetSession,
  });
}

export function AppProvider({ children, queryClient }: { children: ReactNode; queryClient?: QueryClient }) {
  const [client] = useState(() => queryClient ?? createAppQueryClient());
  return (
    <QueryClientProvider client={client}>
      <SessionProvider>{children}</SessionProvider>
    </QueryClientProvider>
  );
}
