// One project.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { projectSchema } from '../../../../shared/api/projects';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/query-keys/projects';

export const getProject = (id: string, signal?: AbortSignal) =>
  api.get(apiRoutes.project(id), projectSchema, { signal });

export const projectQueryOptions = (id: string) =>
  queryOptions({
    queryKey: projectKeys.detail(id),
    queryFn: ({ signal }) => getProject(id, signal),
  });

export const useProject = (id: string | undefined) =>
  useQuery({ ...projectQueryOptions(id ?? ''), enabled: Boolean(id) });
