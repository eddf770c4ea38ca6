// A pool of simulation Web Workers, one per core (capped), shared by single runs and studies. Work is
// submitted in sessions: cancelling a session drops its queued tasks and asks its running ones to stop
// (the engine checks between 50 ms slices), leaving other sessions' work alone. A worker that crashes
// fails its task and is replaced.
import * as Comlink from 'comlink';
import type { SimulationWorkerApi } from '../../../workers/simulation.worker';

export type EngineApi = Comlink.Remote<SimulationWorkerApi>;

export interface EngineWorker {
  api: EngineApi;
  /** Rejects when the worker fails to load or dies; never resolves. */
  crashed: Promise<never>;
  terminate(): void;
}

export class CancelledError extends Error {
  override readonly name = 'CancelledError';
  constructor() {
    super('cancelled');
  }
}

export const isCancelled = (e: unknown): e is CancelledError => e instanceof CancelledError;

/** Most machines gain little beyond eight workers, and each holds a copy of the engine. */
export const MAX_WORKERS = 8;

export function defaultPoolSize(): number {
  const cores = typeof navigator !== 'undefined' ? navigator.hardwareConcurrency : undefined;
  return Math.max(1, Math.min(MAX_WORKERS, cores || 2));
}

export function createEngineWorker(): EngineWorker {
  const worker = new Worker(new URL('../../../workers/simulation.worker.ts', import.meta.url), {
    type: 'module',
    name: 'lanewright-simulation',
  });
  const api = Comlink.wrap<SimulationWorkerApi>(worker);
  const crashed = new Promise<never>((_, reject) => {
    worker.addEventListener('error', (event) =>
      reject(new Error(event.message || 'a simulation worker stopped unexpectedly')),
    );
  });
  crashed.catch(() => undefined);
  return {
    api,
    crashed,
    terminate: () => {
      api[Comlink.releaseProxy]();
      worker.terminate();
    },
  };
}

type Task = {
  session: PoolSession;
  run: (api: EngineApi) => Promise<unknown>;
  resolve: (v: unknown) => void;
  reject: (e: unknown) => void;
};
type Slot = { worker: EngineWorker | null; task: Task | null };

export class EnginePool {
  private readonly slots: Slot[];
  private readonly queue: Task[] = [];

  constructor(
    readonly size: number = defaultPoolSize(),
    private readonly create: () => EngineWorker = createEngineWorker,
  ) {
    this.slots = Array.from({ length: Math.max(1, size) }, () => ({ worker: null, task: null }));
  }

  session(): PoolSession {
    return new PoolSession(this);
  }

  /** @internal used by PoolSession */
  enqueue<T>(session: PoolSession, run: (api: EngineApi) => Promise<T>): Promise<T> {
    return new Promise<T>((resolve, reject) => {
      this.queue.push({ session, run, resolve: resolve as (v: unknown) => void, reject });
      this.dispatch();
    });
  }

  /** @internal */
  cancelSession(session: PoolSession): void {
    for (let i = this.queue.length - 1; i >= 0; i--) {
      if (this.queue[i].session === session) this.queue.splice(i, 1)[0].reject(new CancelledError());
    }
    for (const slot of this.slots) if (slot.task?.session === session && slot.worker) void slot.worker.api.cancel();
  }

  terminate(): void {
    for (const task of this.queue.splice(0)) task.reject(new CancelledError());
    for (const slot of this.slots) {
      slot.task?.reject(new CancelledError());
      slot.task = null;
      slot.worker?.terminate();
      slot.worker = null;
    }
  }

  private dispatch(): void {
    for (const slot of this.slots) {
      if (slot.task || this.queue.length === 0) continue;
      const task = this.queue.shift()!;
      slot.task = task;
      slot.worker ??= this.create();
      const worker = slot.worker;
      Promise.race([task.run(worker.api), worker.crashed])
        .then(task.resolve, (error: unknown) => {
          if (slot.worker === worker && !(error instanceof CancelledError)) {
            worker.terminate();
            slot.worker = null;
          }
          task.reject(error);
        })
        .finally(() => {
          if (slot.task === task) slot.task = null;
          this.dispatch();
        });
    }
  }
}

/** One caller's share of the pool: its tasks can be cancelled together. */
export class PoolSession {
  private cancelled = false;

  constructor(private readonly pool: EnginePool) {}

  get size(): number {
    return this.pool.size;
  }

  submit<T>(run: (api: EngineApi) => Promise<T>): Promise<T> {
    if (this.cancelled) return Promise.reject(new CancelledError());
    return this.pool.enqueue(this, run);
  }

  cancel(): void {
    this.cancelled = true;
    this.pool.cancelSession(this);
  }

  get isCancelled(): boolean {
    return this.cancelled;
  }
}

let shared: EnginePool | null = null;

/** The page's pool, made on first use; `?workers=N` in the address overrides its size (for benchmarks). */
export function sharedEnginePool(): EnginePool {
  if (!shared) {
    const asked = typeof location !== 'undefined' ? Number(new URLSearchParams(location.search).get('workers')) : NaN;
    shared = new EnginePool(Number.isInteger(asked) && asked >= 1 ? Math.min(asked, MAX_WORKERS) : defaultPoolSize());
  }
  return shared;
}
