// The page's end of the simulation: each run takes a session of the shared worker pool, so its
// replications spread over the cores, and Cancel stops just that run's work. Playback records one
// replication in a worker of its own, which Cancel terminates.
import * as Comlink from 'comlink';
import type { Progress } from '../../../../workers/engine';
import type { PlaybackOutcome, SimulationWorkerApi, WorkerOutcome } from '../../../../workers/simulation.worker';
import { sharedEnginePool } from '../../../lib/engine/engine-pool';
import { runAcrossPool } from '../../../lib/engine/split-run';

export interface SimulationPort {
  run(scenario: unknown, settings: unknown, onProgress: (progress: Progress) => void): Promise<WorkerOutcome>;
  /** Stops the run's work; a pending run() then settles as cancelled or not at all, so callers stop listening first. */
  terminate(): void;
}

export type OpenSimulationPort = () => SimulationPort;

/** A port that records a playback window instead of running an experiment. */
export interface PlaybackPort {
  playback(
    scenario: unknown,
    settings: unknown,
    request: unknown,
    onProgress: (progress: Progress) => void,
  ): Promise<PlaybackOutcome>;
  terminate(): void;
}

function spawnWorker() {
  const worker = new Worker(new URL('../../../../workers/simulation.worker.ts', import.meta.url), {
    type: 'module',
    name: 'lanewright-simulation',
  });
  const remote = Comlink.wrap<SimulationWorkerApi>(worker);
  // A worker that fails to load or crashes answers nothing over comlink; its error event is the only news.
  const crashed = new Promise<never>((_, reject) => {
    worker.addEventListener('error', (event) =>
      reject(new Error(event.message || 'the simulation worker stopped unexpectedly')),
    );
  });
  crashed.catch(() => undefined);
  const terminate = () => {
    remote[Comlink.releaseProxy]();
    worker.terminate();
  };
  return { remote, crashed, terminate };
}

export const openWorkerPort: OpenSimulationPort = () => {
  const session = sharedEnginePool().session();
  return {
    run: (scenario, settings, onProgress) => runAcrossPool(session, scenario, settings, onProgress),
    terminate: () => session.cancel(),
  };
};

export const openPlaybackPort = (): PlaybackPort => {
  const { remote, crashed, terminate } = spawnWorker();
  return {
    playback: (scenario, settings, request, onProgress) =>
      Promise.race([remote.playback(scenario, settings, request, Comlink.proxy(onProgress)), crashed]),
    terminate,
  };
};
