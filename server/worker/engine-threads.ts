// The worker process's pool of engine threads (piscina), one per core unless told otherwise. A task
// that runs past its time limit is aborted, which ends its thread; piscina starts a fresh one.
import { availableParallelism } from 'node:os';
import Piscina from 'piscina';
import type { StudyJobOutcome } from '../../workers/studies/run-study-job';
import type { EngineTask } from './engine-thread';

export interface EngineThreads {
  size: number;
  run(task: EngineTask, signal: AbortSignal): Promise<StudyJobOutcome>;
  close(): Promise<void>;
}

export function startEngineThreads(threads = availableParallelism()): EngineThreads {
  const pool = new Piscina<EngineTask, StudyJobOutcome>({
    filename: new URL('./engine-thread.ts', import.meta.url).href,
    minThreads: threads,
    maxThreads: threads,
    // A queue of one task per thread at most: the job loop fetches only as many jobs as there are threads.
    maxQueue: threads,
    idleTimeout: 60_000,
  });
  return {
    size: threads,
    run: (task, signal) => pool.run(task, { signal }),
    close: () => pool.destroy(),
  };
}
