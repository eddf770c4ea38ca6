// One scenario with the document of its latest revision.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { scenarioDetailSchema } from '../../../../shared/api/scenarios';
import { api } from '../../../lib/api-client';
import { scenarioKeys } from '../../../lib/query-keys/scenarios';

export const getScenario = (id: string, signal?: AbortSignal) =>
  api.get(apiRoutes.scenario(id), scenarioDetailSchema, { signal });

export const scenarioQueryOptions = (id: string) =>
  queryOptions({
    queryKey: scenarioKeys.detail(id),
    queryFn: ({ signal }) => getScenario(id, signal),
  });

export const useScenario = (id: string) => useQuery(scenarioQueryOptions(id));
