// Renaming a run (its author or an organisation owner).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { runListItemSchema } from '../../../../shared/api/runs';
import { api } from '../../../lib/api-client';
import { runKeys } from '../../../lib/query-keys/runs';

export const renameRun = (id: string, name: string) => api.patch(apiRoutes.run(id), { name }, runListItemSchema);

export function useRenameRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, name }: { id: string; name: string }) => renameRun(id, name),
    onSuccess: (_run, { id }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: runKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: runKeys.detail(id) }),
      ]),
  });
}
