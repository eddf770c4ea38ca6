// The page's end of the simulation: each run takes a session of the shared worker pool, so its
// replications spread over the cores, and Cancel stops just that run's work.
import type { Progress } from '../../../workers/engine';
import type { WorkerOutcome } from '../../../workers/simulation.worker';
import { sharedEnginePool } from '../../lib/engine/engine-pool';
import { runAcrossPool } from '../../lib/engine/split-run';

export interface SimulationPort {
  run(scenario: unknown, settings: unknown, onProgress: (progress: Progress) => void): Promise<WorkerOutcome>;
  /** Stops the run's work; a pending run() then settles as cancelled or not at all, so callers stop listening first. */
  terminate(): void;
}

export type OpenSimulationPort = () => SimulationPort;

export const openWorkerPort: OpenSimulationPort = () => {
  const session = sharedEnginePool().session();
  return {
    run: (scenario, settings, onProgress) => runAcrossPool(session, scenario, settings, onProgress),
    terminate: () => session.cancel(),
  };
};
