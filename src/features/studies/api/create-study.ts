// Making a study: its points and settings; the jobs run afterwards on the study page.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { studyDetailSchema, type CreateStudyInput } from '../../../../shared/api/studies';
import { api } from '../../../lib/api-client';
import { studyKeys } from './keys';

export const createStudy = (projectId: string, input: CreateStudyInput) =>
  api.post(apiRoutes.projectStudies(projectId), input, studyDetailSchema);

export function useCreateStudy(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateStudyInput) => createStudy(projectId, input),
    onSuccess: (study) => {
      queryClient.setQueryData(studyKeys.detail(study.id), study);
      return queryClient.invalidateQueries({ queryKey: studyKeys.lists() });
    },
  });
}
