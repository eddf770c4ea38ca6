// The stored comparison of the runs on screen, which share links point at. Storing is idempotent on the
// server (the same runs give the same comparison), so it is read like any other query.
import { useQuery } from '@tanstack/react-query';
import { comparisonSchema } from '../../../../shared/api/comparisons';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { compareKeys } from './keys';

export const useStoredComparison = (runIds: readonly string[], enabled: boolean) =>
  useQuery({
    queryKey: compareKeys.stored(runIds),
    queryFn: () => api.post(apiRoutes.comparisons, { runIds }, comparisonSchema),
    enabled,
    staleTime: Infinity,
  });
