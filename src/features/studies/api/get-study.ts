// One study with its points and the figures of every finished job.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { studyDetailSchema } from '../../../../shared/api/studies';
import { api } from '../../../lib/api-client';
import { studyKeys } from './keys';

export const getStudy = (id: string, signal?: AbortSignal) =>
  api.get(apiRoutes.study(id), studyDetailSchema, { signal });

export const studyQueryOptions = (id: string) =>
  queryOptions({ queryKey: studyKeys.detail(id), queryFn: ({ signal }) => getStudy(id, signal) });

export const useStudy = (id: string) => useQuery(studyQueryOptions(id));
