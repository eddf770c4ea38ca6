// Runs a scenario revision in the browser and stores the result against that exact revision. The
// run id is chosen once, before the first attempt to save, and every retry sends the same body, so
// a save whose answer was lost can be repeated without making a second run. A finished result is
// kept in memory until it is saved; leaving the page before then asks first.
import { useCallback, useEffect, useState } from 'react';
import type { CreateRunInput, RunListItem } from '../../../../shared/api/runs';
import type { RunSettings } from '../../../../shared/scenario/run-settings';
import { useSimulation, type SimulationOutcome } from '../simulation/hooks/use-simulation';
import { useCreateRun } from '../api/create-run';

export interface RevisionToRun {
  id: string;
  number: number;
  /** The revision's scenario document, exactly as stored. */
  document: unknown;
}

interface PendingSave {
  scenarioId: string;
  input: CreateRunInput;
}

export type SaveState =
  | { status: 'idle' }
  | ({ status: 'saving' } & PendingSave)
  | ({ status: 'failed'; error: unknown } & PendingSave)
  | { status: 'saved'; run: RunListItem };

/** Names runs apart in a list before anyone renames them: revision, length, seed and any carrier override. */
export function defaultRunName(revisionNumber: number, settings: RunSettings): string {
  const carriers = settings.carriers === undefined ? '' : `, ${settings.carriers} carriers`;
  return `Revision ${revisionNumber}: ${settings.replications} × ${settings.hours} h, seed ${settings.seed}${carriers}`;
}

export function useRunAndSave(onSaved?: (run: RunListItem) => void) {
  const simulation = useSimulation();
  const createRun = useCreateRun();
  const [save, setSave] = useState<SaveState>({ status: 'idle' });

  const attemptSave = useCallback(
    async (pending: PendingSave) => {
      setSave({ status: 'saving', ...pending });
      try {
        const run = await createRun.mutateAsync(pending);
        setSave({ status: 'saved', run });
        onSaved?.(run);
      } catch (error) {
        setSave({ status: 'failed', ...pending, error });
      }
    },
    [createRun, onSaved],
  );

  const run = useCallback(
    async (scenarioId: string, revision: RevisionToRun, settings: RunSettings): Promise<SimulationOutcome> => {
      setSave({ status: 'idle' });
      const outcome = await simulation.start(revision.document, settings);
      if (outcome.status === 'finished') {
        const input = {
          clientRunId: crypto.randomUUID(),
          revisionId: revision.id,
          name: defaultRunName(revision.number, settings),
          settings,
          results: outcome.result,
        };
        await attemptSave({ scenarioId, input });
      }
      return outcome;
    },
    [attemptSave, simulation],
  );

  const retrySave = useCallback(() => {
    if (save.status === 'failed') void attemptSave({ scenarioId: save.scenarioId, input: save.input });
  }, [attemptSave, save]);

  const unsaved = simulation.status === 'running' || save.status === 'saving' || save.status === 'failed';
  useEffect(() => {
    if (!unsaved) return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [unsaved]);

  return { simulation, save, run, retrySave };
}
