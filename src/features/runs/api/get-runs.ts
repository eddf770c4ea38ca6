// The stored runs of a scenario or of a whole project, newest first, without their results.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRoutes } from '../../../../shared/api/routes';
import { runListItemSchema } from '../../../../shared/api/runs';
import { api } from '../../../lib/api-client';
import { runKeys, type RunListScope } from '../../../lib/query-keys/runs';

const runListSchema = z.array(runListItemSchema);

export const getRuns = (scope: RunListScope, signal?: AbortSignal) =>
  api.get(
    'scenarioId' in scope ? apiRoutes.scenarioRuns(scope.scenarioId) : apiRoutes.projectRuns(scope.projectId),
    runListSchema,
    { signal },
  );

export const runsQueryOptions = (scope: RunListScope) =>
  queryOptions({
    queryKey: runKeys.list(scope),
    queryFn: ({ signal }) => getRuns(scope, signal),
  });

export const useRuns = (scope: RunListScope) => useQuery(runsQueryOptions(scope));
