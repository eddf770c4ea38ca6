// Cancelling, resuming or renaming a study.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { studyListItemSchema, type UpdateStudyInput } from '../../../../shared/api/studies';
import { api } from '../../../lib/api-client';
import { studyKeys } from './keys';

export const updateStudy = (id: string, input: UpdateStudyInput) =>
  api.patch(apiRoutes.study(id), input, studyListItemSchema);

export function useUpdateStudy(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateStudyInput) => updateStudy(id, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: studyKeys.all }),
  });
}
