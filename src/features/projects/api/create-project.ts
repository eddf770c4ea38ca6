// Creating a project; every project list is refetched afterwards.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { projectSchema, type CreateProjectInput } from '../../../../shared/api/projects';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/query-keys/projects';

export const createProject = (input: CreateProjectInput) => api.post(apiRoutes.projects, input, projectSchema);

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProject,
    onSuccess: (project) => {
      queryClient.setQueryData(projectKeys.detail(project.id), project);
      return queryClient.invalidateQueries({ queryKey: projectKeys.lists() });
    },
  });
}
