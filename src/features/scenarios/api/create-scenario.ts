// Creating a scenario in a project. The project's scenario list and its
// scenario count change, so both families are invalidated by prefix.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { scenarioSummarySchema, type CreateScenarioInput } from '../../../../shared/api/scenarios';
import { api } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/query-keys/projects';
import { scenarioKeys } from '../../../lib/query-keys/scenarios';

export const createScenario = (projectId: string, input: CreateScenarioInput) =>
  api.post(apiRoutes.projectScenarios(projectId), input, scenarioSummarySchema);

export function useCreateScenario(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateScenarioInput) => createScenario(projectId, input),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: scenarioKeys.list(projectId) }),
        queryClient.invalidateQueries({ queryKey: projectKeys.all }),
      ]),
  });
}
