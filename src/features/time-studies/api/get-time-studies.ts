// The time studies of one station of a scenario, newest first, without their samples.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { timeStudyListSchema } from '../../../../shared/api/time-studies';
import { api } from '../../../lib/api-client';
import { timeStudyKeys, type TimeStudyListScope } from '../../../lib/query-keys/time-studies';

export const getTimeStudies = ({ scenarioId, stationId }: TimeStudyListScope, signal?: AbortSignal) =>
  api.get(apiRoutes.scenarioTimeStudies(scenarioId), timeStudyListSchema, { query: { stationId }, signal });

export const timeStudiesQueryOptions = (scope: TimeStudyListScope) =>
  queryOptions({
    queryKey: timeStudyKeys.list(scope),
    queryFn: ({ signal }) => getTimeStudies(scope, signal),
  });

export const useTimeStudies = (scope: TimeStudyListScope) => useQuery(timeStudiesQueryOptions(scope));
