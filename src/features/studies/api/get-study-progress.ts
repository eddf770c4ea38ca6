// A server study's progress, polled while it runs: jobs done, time left, jobs that failed with their reason.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { studyProgressSchema } from '../../../../shared/api/studies';
import { api } from '../../../lib/api-client';
import { studyKeys } from './keys';

/** Often enough to feel live, rarely enough that many open pages cost the server little. */
export const PROGRESS_POLL_MS = 2_000;

export const getStudyProgress = (id: string, signal?: AbortSignal) =>
  api.get(apiRoutes.studyProgress(id), studyProgressSchema, { signal });

export const studyProgressQueryOptions = (id: string) =>
  queryOptions({
    queryKey: studyKeys.progress(id),
    queryFn: ({ signal }) => getStudyProgress(id, signal),
    refetchInterval: (query) => (query.state.data?.status === 'running' ? PROGRESS_POLL_MS : false),
  });

export const useStudyProgress = (id: string) => useQuery(studyProgressQueryOptions(id));
