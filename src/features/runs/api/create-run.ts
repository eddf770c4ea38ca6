// Saving a finished run. The body carries the client's run id, so sending the same body again
// after a lost answer returns the first run instead of storing a second.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { runListItemSchema, type CreateRunInput } from '../../../../shared/api/runs';
import { api } from '../../../lib/api-client';
import { scenarioKeys } from '../../../lib/query-keys/scenarios';
import { runKeys } from '../../../lib/query-keys/runs';

export const createRun = (scenarioId: string, input: CreateRunInput) =>
  api.post(apiRoutes.scenarioRuns(scenarioId), input, runListItemSchema);

export function useCreateRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ scenarioId, input }: { scenarioId: string; input: CreateRunInput }) => createRun(scenarioId, input),
    // Scenario summaries carry a run count.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: runKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: scenarioKeys.all }),
      ]),
  });
}
