// One page of the stored runs of a scenario or of a whole project, sorted and filtered by the server,
// without their results.
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { runsPageSchema, type ListRunsQuery } from '../../../../shared/api/runs';
import { api } from '../../../lib/api-client';
import { runKeys, type RunListScope } from '../../../lib/query-keys/runs';

export type RunsPageRequest = Partial<ListRunsQuery>;

const queryText = (request: RunsPageRequest): Record<string, string | undefined> =>
  Object.fromEntries(
    Object.entries(request).map(([key, value]) => [key, value === undefined ? undefined : String(value)]),
  );

export const getRunsPage = (scope: RunListScope, request: RunsPageRequest, signal?: AbortSignal) =>
  api.get(
    'scenarioId' in scope ? apiRoutes.scenarioRuns(scope.scenarioId) : apiRoutes.projectRuns(scope.projectId),
    runsPageSchema,
    { signal, query: queryText(request) },
  );

export const runsPageQueryOptions = (scope: RunListScope, request: RunsPageRequest = {}) =>
  queryOptions({
    queryKey: runKeys.list(scope, request),
    queryFn: ({ signal }) => getRunsPage(scope, request, signal),
    // The table keeps showing the page it has while the next sort, filter or page loads.
    placeholderData: keepPreviousData,
  });

export const useRunsPage = (scope: RunListScope, request: RunsPageRequest = {}) =>
  useQuery(runsPageQueryOptions(scope, request));
