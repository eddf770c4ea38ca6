// The TanStack Query client. A 401 from any query or mutation means the
// session ended; the app decides what that does (it sends the user to sign-in).
import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiRequestError } from './api-client';

const MAX_RETRIES = 2;

/** Client errors will not change on retry; only network trouble and server faults are worth repeating. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiRequestError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < MAX_RETRIES;
}

export interface QueryClientHooks {
  onUnauthenticated: (client: QueryClient) => void;
}

export function createQueryClient(hooks: QueryClientHooks): QueryClient {
  const onError = (error: unknown) => {
    if (isApiRequestError(error) && error.status === 401) hooks.onUnauthenticated(client);
  };
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({ onError }),
    mutationCache: new MutationCache({ onError }),
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 30_000, refetchOnWindowFocus: false },
      mutations: { retry: false },
    },
  });
  return client;
}
