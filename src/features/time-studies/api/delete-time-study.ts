// Deleting a time study. The detail is dropped, not refetched: it is gone.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { okSchema } from '../../../../shared/api/common';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { timeStudyKeys } from '../../../lib/query-keys/time-studies';

export const deleteTimeStudy = (id: string) => api.delete(apiRoutes.timeStudy(id), okSchema);

export function useDeleteTimeStudy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteTimeStudy,
    onSuccess: (_ok, id) => {
      queryClient.removeQueries({ queryKey: timeStudyKeys.detail(id) });
      return queryClient.invalidateQueries({ queryKey: timeStudyKeys.lists() });
    },
  });
}
