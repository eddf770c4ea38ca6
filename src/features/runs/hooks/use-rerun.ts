// Repeats a stored run: fetches the exact revision it was computed from and runs it again with the
// same settings and seed, then saves the new run.
import { useState } from 'react';
import type { RunListItem } from '../../../../shared/api/runs';
import { useLoadRevision } from './revision-source';
import { useRunAndSave } from './use-run-and-save';

export function useRerun() {
  const loadRevision = useLoadRevision();
  const runAndSave = useRunAndSave();
  const [source, setSource] = useState<RunListItem | null>(null);
  const [loadError, setLoadError] = useState<unknown>(null);

  const rerun = async (run: RunListItem) => {
    setSource(run);
    setLoadError(null);
    try {
      const revision = await loadRevision(run.scenarioId, run.revisionNumber);
      await runAndSave.run(run.scenarioId, revision, run.settings);
    } catch (error) {
      setLoadError(error);
    }
  };

  const busy = runAndSave.simulation.status === 'running' || runAndSave.save.status === 'saving';
  return { ...runAndSave, source, loadError, busy, rerun };
}
