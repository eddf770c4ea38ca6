// Restoring an old revision saves its document again as a new revision; history is never rewritten.
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { Revision } from '../../../../../shared/api/scenarios';
import { scenarioRevisionQueryOptions } from '../../api/get-revision';
import { useCreateRevision } from '../api/create-revision';

export const restoreMessage = (number: number) => `Restored revision ${number}`;

export function useRestoreRevision(scenarioId: string) {
  const queryClient = useQueryClient();
  const createRevision = useCreateRevision(scenarioId);
  const [error, setError] = useState<string | null>(null);
  const [restoring, setRestoring] = useState<number | null>(null);

  const restore = async (number: number, latestNumber: number): Promise<Revision | null> => {
    setError(null);
    setRestoring(number);
    try {
      const old = await queryClient.fetchQuery(scenarioRevisionQueryOptions(scenarioId, number));
      return await createRevision.mutateAsync({
        document: old.document,
        message: restoreMessage(number),
        baseRevisionNumber: latestNumber,
      });
    } catch (cause) {
      setError(cause instanceof Error ? cause.message : `Revision ${number} could not be restored.`);
      return null;
    } finally {
      setRestoring(null);
    }
  };
  return { restore, restoring, error };
}
