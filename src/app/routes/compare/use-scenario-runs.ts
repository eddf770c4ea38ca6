// Runs two to four scenarios' latest revisions one after another with the same settings and seed
// (common random numbers), stores each run, and hands back the stored runs' ids for the comparison.
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useRef, useState } from 'react';
import type { RunSettings } from '../../../../shared/scenario/run-settings';
import type { ScenarioChoice, ScenarioRunProgress } from '../../../features/compare/components/compare-setup';
import { useCreateRun } from '../../../features/runs/api/create-run';
import { scenarioRevisionQueryOptions } from '../../../features/scenarios/api/get-revision';
import { useSimulation } from '../../../features/runs/simulation/hooks/use-simulation';

export function useScenarioRuns(onDone: (runIds: string[]) => void) {
  const simulation = useSimulation();
  const createRun = useCreateRun();
  const queryClient = useQueryClient();
  const [current, setCurrent] = useState<{ index: number; count: number; name: string } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const cancelled = useRef(false);

  const start = useCallback(
    async (scenarios: readonly ScenarioChoice[], settings: RunSettings) => {
      cancelled.current = false;
      setProblem(null);
      const runIds: string[] = [];
      try {
        for (const [index, scenario] of scenarios.entries()) {
          setCurrent({ index, count: scenarios.length, name: scenario.name });
          const revision = await queryClient.fetchQuery(
            scenarioRevisionQueryOptions(scenario.id, scenario.latestRevisionNumber),
          );
          const outcome = await simulation.start(revision.document, settings);
          if (cancelled.current || outcome.status === 'cancelled') return;
          if (outcome.status !== 'finished') {
            setProblem(
              `${scenario.name} did not finish: ${outcome.message}. Open the scenario to fix it, then run the comparison again.`,
            );
            return;
          }
          const input = {
            clientRunId: crypto.randomUUID(),
            revisionId: revision.id,
            name: `Comparison: ${settings.replications} × ${settings.hours} h, seed ${settings.seed}`,
            settings,
            results: outcome.result,
          };
          const run = await createRun.mutateAsync({ scenarioId: scenario.id, input });
          runIds.push(run.id);
        }
        onDone(runIds);
      } catch (error) {
        setProblem(error instanceof Error ? error.message : 'The comparison runs stopped unexpectedly.');
      } finally {
        setCurrent(null);
      }
    },
    [createRun, onDone, queryClient, simulation],
  );

  const cancel = useCallback(() => {
    cancelled.current = true;
    simulation.cancel();
  }, [simulation]);

  const progress: ScenarioRunProgress | null = current
    ? {
        label: `Running ${current.name} (${current.index + 1} of ${current.count})…`,
        fraction: (current.index + (simulation.progress?.fraction ?? 0)) / current.count,
      }
    : null;
  return { start, cancel, progress, problem };
}
