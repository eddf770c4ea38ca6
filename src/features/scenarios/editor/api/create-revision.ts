// Saving a scenario: every save is a new immutable revision made from the editor's base revision;
// the server answers 409 when someone saved in between. The scenario, its list entry and its
// history all change, so the whole scenario family is refreshed.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRoutes } from '../../../../../shared/api/routes';
import { revisionSchema, type CreateRevisionInput } from '../../../../../shared/api/scenarios';
import { api } from '../../../../lib/api-client';
import { scenarioKeys } from '../../../../lib/query-keys/scenarios';

export const createRevision = (scenarioId: string, input: CreateRevisionInput) =>
  api.post(apiRoutes.scenarioRevisions(scenarioId), input, revisionSchema);

export function useCreateRevision(scenarioId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateRevisionInput) => createRevision(scenarioId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: scenarioKeys.all }),
  });
}
