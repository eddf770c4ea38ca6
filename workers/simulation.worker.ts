// The Web Worker around the engine: exposes the worker API through comlink and nothing else.
// Progress comes back through a proxied callback (Comlink.proxy on the caller's side); cancel() sets
// a flag the engine checks between slices.
import * as Comlink from 'comlink';
import { createWorkerApi } from './engine/worker-api';

export type { RangeOutcome, SimulationWorkerApi, WorkerOutcome } from './engine/worker-api';
export type { StudyJobOutcome } from './studies/run-study-job';

Comlink.expose(createWorkerApi(() => performance.now()));
