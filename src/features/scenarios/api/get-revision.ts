// One revision of a scenario with its document: for the read-only view and restoring it, and for what a
// stored run was computed from (to rerun it, to list its stations). Revisions never change, so a fetched
// one stays fresh.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { revisionSchema } from '../../../../shared/api/scenarios';
import { api } from '../../../lib/api-client';
import { scenarioKeys } from '../../../lib/query-keys/scenarios';

export const getScenarioRevision = (scenarioId: string, number: number, signal?: AbortSignal) =>
  api.get(apiRoutes.scenarioRevision(scenarioId, number), revisionSchema, { signal });

export const scenarioRevisionQueryOptions = (scenarioId: string, number: number) =>
  queryOptions({
    queryKey: scenarioKeys.revision(scenarioId, number),
    queryFn: ({ signal }) => getScenarioRevision(scenarioId, number, signal),
    staleTime: Infinity,
  });

/** Waits while the revision number is not known yet (a run still loading). */
export const useScenarioRevision = (scenarioId: string, number: number | undefined) =>
  useQuery({ ...scenarioRevisionQueryOptions(scenarioId, number ?? 0), enabled: number !== undefined });
