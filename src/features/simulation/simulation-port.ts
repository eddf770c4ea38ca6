// The page's end of one simulation worker. Each run gets its own worker so Cancel can simply
// terminate it, whatever the engine is doing, and nothing of a run outlives it.
import * as Comlink from 'comlink';
import type { Progress } from '../../../workers/engine';
import type { PlaybackOutcome, SimulationWorkerApi, WorkerOutcome } from '../../../workers/simulation.worker';

export interface SimulationPort {
  run(scenario: unknown, settings: unknown, onProgress: (progress: Progress) => void): Promise<WorkerOutcome>;
  /** Stops the worker at once; a pending run() then never settles, so callers stop listening first. */
  terminate(): void;
}

export type OpenSimulationPort = () => SimulationPort;

/** A port that records a playback window instead of running an experiment. */
export interface PlaybackPort {
  playback(scenario: unknown, settings: unknown, request: unknown, onProgress: (progress: Progress) => void): Promise<PlaybackOutcome>;
  terminate(): void;
}

function spawnWorker() {
  const worker = new Worker(new URL('../../../workers/simulation.worker.ts', import.meta.url), { type: 'module', name: 'lanewright-simulation' });
  const remote = Comlink.wrap<SimulationWorkerApi>(worker);
  // A worker that fails to load or crashes answers nothing over comlink; its error event is the only news.
  const crashed = new Promise<never>((_, reject) => {
    worker.addEventListener('error', (event) => reject(new Error(event.message || 'the simulation worker stopped unexpectedly')));
  });
  crashed.catch(() => undefined);
  const terminate = () => {
    remote[Comlink.releaseProxy]();
    worker.terminate();
  };
  return { remote, crashed, terminate };
}

export const openWorkerPort: OpenSimulationPort = () => {
  const { remote, crashed, terminate } = spawnWorker();
  return { run: (scenario, settings, onProgress) => Promise.race([remote.run(scenario, settings, Comlink.proxy(onProgress)), crashed]), terminate };
};

export const openPlaybackPort = (): PlaybackPort => {
  const { remote, crashed, terminate } = spawnWorker();
  return {
    playback: (scenario, settings, request, onProgress) => Promise.race([remote.playback(scenario, settings, request, Comlink.proxy(onProgress)), crashed]),
    terminate,
  };
};
