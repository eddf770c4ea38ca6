// The projects of one organisation.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { projectSchema } from '../../../../shared/api/projects';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/query-keys/projects';

const projectListSchema = z.array(projectSchema);

export const getProjects = (organisationId: string | undefined, signal?: AbortSignal) =>
  api.get(apiRoutes.projects, projectListSchema, { query: { organisationId }, signal });

export const projectsQueryOptions = (organisationId: string | undefined) =>
  queryOptions({
    queryKey: projectKeys.list(organisationId),
    queryFn: ({ signal }) => getProjects(organisationId, signal),
  });

export const useProjects = (organisationId: string | undefined) => useQuery(projectsQueryOptions(organisationId));
