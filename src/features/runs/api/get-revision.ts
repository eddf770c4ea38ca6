// One revision of a scenario with its document: what a stored run was computed from, needed to
// rerun it and to list its stations for the controls engineer. Revisions never change.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { revisionSchema } from '../../../../shared/api/scenarios';
import { api } from '../../../lib/api-client';
import { scenarioKeys } from '../../scenarios/api/keys';

export const getRevision = (scenarioId: string, number: number, signal?: AbortSignal) =>
  api.get(apiRoutes.scenarioRevision(scenarioId, number), revisionSchema, { signal });

export const revisionQueryOptions = (scenarioId: string, number: number) =>
  queryOptions({
    queryKey: [...scenarioKeys.all, 'revision', scenarioId, number] as const,
    queryFn: ({ signal }) => getRevision(scenarioId, number, signal),
    staleTime: Infinity,
  });

export const useRevision = (scenarioId: string, number: number | undefined) =>
  useQuery({ ...revisionQueryOptions(scenarioId, number ?? 0), enabled: number !== undefined });
