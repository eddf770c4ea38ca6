// Saving one finished job. The server keys results by study, point and first replication, so
// sending the same job again (a retry after a lost answer) stores nothing twice.
import { apiRoutes } from '../../../../shared/api/routes';
import { saveJobResultAnswerSchema, type SaveJobResultInput } from '../../../../shared/api/studies';
import { api } from '../../../lib/api-client';

export const saveJobResult = (studyId: string, input: SaveJobResultInput) =>
  api.post(apiRoutes.studyResults(studyId), input, saveJobResultAnswerSchema);
