// Who is signed in, from the session check: a visitor gets `null` (an ordinary 200 answer, so the
// browser logs no failed request), and route guards read "nobody" and redirect.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { sessionSchema, type Me } from '../../../../shared/api/auth';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { authKeys } from '../../../lib/query-keys/auth';

export async function getMe(signal?: AbortSignal): Promise<Me | null> {
  return (await api.get(apiRoutes.session, sessionSchema, { signal })).me;
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });

export const useMe = () => useQuery(meQueryOptions());
