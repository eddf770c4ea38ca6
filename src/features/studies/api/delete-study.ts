// Deleting a study (its author or an organisation owner).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { okSchema } from '../../../../shared/api/common';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { studyKeys } from './keys';

export const deleteStudy = (id: string) => api.delete(apiRoutes.study(id), okSchema);

export function useDeleteStudy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => deleteStudy(id),
    onSuccess: (_ok, id) => {
      queryClient.removeQueries({ queryKey: studyKeys.detail(id) });
      return queryClient.invalidateQueries({ queryKey: studyKeys.lists() });
    },
  });
}
