// One stored run with its full result. A stored run never changes except its name, so it is
// kept fresh for long.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { runDetailSchema } from '../../../../shared/api/runs';
import { api } from '../../../lib/api-client';
import { runKeys } from '../../../lib/query-keys/runs';

export const getRun = (id: string, signal?: AbortSignal) => api.get(apiRoutes.run(id), runDetailSchema, { signal });

export const runQueryOptions = (id: string) =>
  queryOptions({
    queryKey: runKeys.detail(id),
    queryFn: ({ signal }) => getRun(id, signal),
    staleTime: 5 * 60_000,
  });

export const useRun = (id: string) => useQuery(runQueryOptions(id));
