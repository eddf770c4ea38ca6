// The scenarios of one project, without their documents.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRoutes } from '../../../../shared/api/routes';
import { scenarioSummarySchema } from '../../../../shared/api/scenarios';
import { api } from '../../../lib/api-client';
import { scenarioKeys } from '../../../lib/query-keys/scenarios';

const scenarioListSchema = z.array(scenarioSummarySchema);

export const getScenarios = (projectId: string, signal?: AbortSignal) =>
  api.get(apiRoutes.projectScenarios(projectId), scenarioListSchema, { signal });

export const scenariosQueryOptions = (projectId: string) =>
  queryOptions({
    queryKey: scenarioKeys.list(projectId),
    queryFn: ({ signal }) => getScenarios(projectId, signal),
  });

export const useScenarios = (projectId: string) => useQuery(scenariosQueryOptions(projectId));
