// Uploading a CSV of measured cycle times for a station. The answer is the full study, so it goes
// straight into the detail cache and the station's list is refetched.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRoutes } from '../../../../shared/api/routes';
import { timeStudyDetailSchema } from '../../../../shared/api/time-studies';
import { api } from '../../../lib/api-client';
import { timeStudyKeys } from '../../../lib/query-keys/time-studies';

export interface UploadTimeStudyInput {
  scenarioId: string;
  stationId: string;
  file: File;
  name?: string;
}

export function uploadTimeStudy({ scenarioId, stationId, file, name }: UploadTimeStudyInput) {
  const form = new FormData();
  form.set('stationId', stationId);
  if (name) form.set('name', name);
  form.set('file', file, file.name);
  return api.postForm(apiRoutes.scenarioTimeStudies(scenarioId), form, timeStudyDetailSchema);
}

export function useUploadTimeStudy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadTimeStudy,
    onSuccess: (study) => {
      queryClient.setQueryData(timeStudyKeys.detail(study.id), study);
      return queryClient.invalidateQueries({ queryKey: timeStudyKeys.lists() });
    },
  });
}
