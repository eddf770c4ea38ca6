// One time study with its samples and analysis. A study never changes once uploaded, so it stays fresh.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { timeStudyDetailSchema } from '../../../../shared/api/time-studies';
import { api } from '../../../lib/api-client';
import { timeStudyKeys } from '../../../lib/query-keys/time-studies';

export const getTimeStudy = (id: string, signal?: AbortSignal) =>
  api.get(apiRoutes.timeStudy(id), timeStudyDetailSchema, { signal });

export const timeStudyQueryOptions = (id: string) =>
  queryOptions({
    queryKey: timeStudyKeys.detail(id),
    queryFn: ({ signal }) => getTimeStudy(id, signal),
    staleTime: Number.POSITIVE_INFINITY,
  });

export const useTimeStudy = (id: string | null) =>
  useQuery({ ...timeStudyQueryOptions(id ?? ''), enabled: id !== null });
