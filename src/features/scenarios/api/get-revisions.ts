// The revision history of a scenario, newest first as the server sends it.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRoutes } from '../../../../shared/api/routes';
import { revisionSummarySchema } from '../../../../shared/api/scenarios';
import { api } from '../../../lib/api-client';
import { scenarioKeys } from '../../../lib/query-keys/scenarios';

const revisionListSchema = z.array(revisionSummarySchema);

export const getRevisions = (scenarioId: string, signal?: AbortSignal) =>
  api.get(apiRoutes.scenarioRevisions(scenarioId), revisionListSchema, { signal });

export const revisionsQueryOptions = (scenarioId: string) =>
  queryOptions({
    queryKey: scenarioKeys.revisions(scenarioId),
    queryFn: ({ signal }) => getRevisions(scenarioId, signal),
  });

export const useRevisions = (scenarioId: string) => useQuery(revisionsQueryOptions(scenarioId));
