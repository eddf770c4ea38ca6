// Who is signed in. A 401 is the ordinary answer for a visitor, so it becomes
// `null` rather than an error: route guards read "nobody" and redirect.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { meSchema, type Me } from '../../../../shared/api/auth';
import { apiRoutes } from '../../../../shared/api/routes';
import { api, isApiRequestError } from '../../../lib/api-client';
import { authKeys } from '../../../lib/query-keys/auth';

export async function getMe(signal?: AbortSignal): Promise<Me | null> {
  try {
    return await api.get(apiRoutes.me, meSchema, { signal });
  } catch (error) {
    if (isApiRequestError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });

export const useMe = () => useQuery(meQueryOptions());
