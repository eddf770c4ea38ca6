// Forgets everything cached for the signed-in user and records "nobody is
// signed in". The me query is kept and set to null rather than removed, so
// components already watching it (header, guards) see the change at once.
import type { QueryClient } from '@tanstack/react-query';
import { authKeys } from '../../../lib/query-keys/auth';

export function removeUserData(queryClient: QueryClient): void {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
}

export function forgetSession(queryClient: QueryClient): void {
  removeUserData(queryClient);
  queryClient.setQueryData(authKeys.me(), null);
}
