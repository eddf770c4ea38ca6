// The providers every page needs. A 401 anywhere marks the user as signed out;
// RequireAuth then sends them to sign-in with the address they were on.
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { forgetSession } from '../features/auth/api/forget-session';
import { SessionProvider } from '../features/auth/components/session-provider';
import { RevisionSourceContext, type LoadRevision } from '../features/runs/hooks/revision-source';
import { scenarioRevisionQueryOptions } from '../features/scenarios/api/get-revision';
import { createQueryClient } from '../lib/query-client';

export function createAppQueryClient(): QueryClient {
  return createQueryClient({
    onUnauthenticated: forgetSession,
  });
}

export function AppProvider({ children, queryClient }: { children: ReactNode; queryClient?: QueryClient }) {
  const [client] = useState(() => queryClient ?? createAppQueryClient());
  // Runs are repeated from the scenario revision they were computed from, read through the cache.
  const [loadRevision] = useState(() => {
    const load: LoadRevision = (scenarioId, number) =>
      client.fetchQuery(scenarioRevisionQueryOptions(scenarioId, number));
    return load;
  });
  return (
    <QueryClientProvider client={client}>
      <RevisionSourceContext.Provider value={loadRevision}>
        <SessionProvider>{children}</SessionProvider>
      </RevisionSourceContext.Provider>
    </QueryClientProvider>
  );
}
