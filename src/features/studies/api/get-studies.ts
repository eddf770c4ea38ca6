// The studies of a project, newest first, with their progress.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRoutes } from '../../../../shared/api/routes';
import { studyListItemSchema } from '../../../../shared/api/studies';
import { api } from '../../../lib/api-client';
import { studyKeys } from './keys';

export const getStudies = (projectId: string, signal?: AbortSignal) =>
  api.get(apiRoutes.projectStudies(projectId), z.array(studyListItemSchema), { signal });

export const studiesQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: studyKeys.list(projectId), queryFn: ({ signal }) => getStudies(projectId, signal) });

export const useStudies = (projectId: string) => useQuery(studiesQueryOptions(projectId));
