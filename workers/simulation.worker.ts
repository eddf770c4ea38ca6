// The Web Worker around the engine: exposes the worker API through comlink and nothing else.
// Progress comes back through a proxied callback (Comlink.proxy on the caller's side); cancel() sets
// a flag the engine checks between slices.
import * as Comlink from 'comlink';
import { createWorkerApi, traceBuffers } from './engine/worker-api';

export type { PlaybackOutcome, RangeOutcome, SimulationWorkerApi, WorkerOutcome } from './engine/worker-api';
export type { StudyJobOutcome } from './studies/run-study-job';

const api = createWorkerApi(() => performance.now());
// A playback trace is tens of megabytes at most: its buffers move to the page instead of being copied.
Comlink.expose({
  ...api,
  playback: async (...args: Parameters<typeof api.playback>) => {
    const outcome = await api.playback(...args);
    return outcome.ok ? Comlink.transfer(outcome, traceBuffers(outcome.trace)) : outcome;
  },
});
