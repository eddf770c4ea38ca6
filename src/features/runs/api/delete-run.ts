// Deleting a run (its author or an organisation owner). The detail is dropped, not refetched: it is gone.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { okSchema } from '../../../../shared/api/common';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { scenarioKeys } from '../../../lib/query-keys/scenarios';
import { runKeys } from '../../../lib/query-keys/runs';

export const deleteRun = (id: string) => api.delete(apiRoutes.run(id), okSchema);

export function useDeleteRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => deleteRun(id),
    onSuccess: (_ok, id) => {
      queryClient.removeQueries({ queryKey: runKeys.detail(id) });
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: runKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: scenarioKeys.all }),
      ]);
    },
  });
}
