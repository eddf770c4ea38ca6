// A simulation port that runs the real engine in the test's own thread, since happy-dom has no Web
// Worker. It answers in the worker's outcome shape, and counts the runs it was asked for.
import { InvalidInputError, runExperiment } from '../../../../workers/engine';
import type { OpenSimulationPort } from '../../../../src/features/runs/simulation/simulation-port';

export function inProcessPorts() {
  const runs: { scenario: unknown; settings: unknown }[] = [];
  const open: OpenSimulationPort = () => ({
    run: async (scenario, settings, onProgress) => {
      runs.push({ scenario, settings });
      try {
        return {
          ok: true,
          result: await runExperiment(scenario, settings, { onProgress, now: () => performance.now() }),
        };
      } catch (error) {
        if (error instanceof InvalidInputError)
          return { ok: false, kind: 'invalid', message: error.message, issues: error.issues };
        throw error;
      }
    },
    terminate: () => undefined,
  });
  return { open, runs };
}
