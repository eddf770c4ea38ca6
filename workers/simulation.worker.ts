// The Web Worker around the engine: exposes the facade through comlink and nothing else. Progress
// comes back through a proxied callback; cancel() sets a flag the engine checks between slices.
// run() resolves to an outcome object rather than rejecting, because an error crossing comlink keeps
// only its name and message, and the caller needs the field paths or the stop reason.
import * as Comlink from 'comlink';
import type { RunResult } from '../shared/results/run-result';
import { ENGINE_VERSION, InvalidInputError, isSimulationStopped, runExperiment, validateScenario, type GridlockEntry, type Progress, type StopReason, type ValidationIssue } from './engine';

export type WorkerOutcome =
  | { ok: true; result: RunResult }
  | { ok: false; kind: 'invalid'; message: string; issues: ValidationIssue[] }
  | { ok: false; kind: 'stopped'; reason: StopReason; message: string; gridlock: GridlockEntry[] };

let cancelled = false;

const api = {
  engineVersion: () => ENGINE_VERSION,
  validateScenario,
  async run(scenario: unknown, settings: unknown, onProgress?: (p: Progress) => void): Promise<WorkerOutcome> {
    cancelled = false;
    try {
      const result = await runExperiment(scenario, settings, {
        onProgress: onProgress ? (p) => void onProgress(p) : undefined,
        isCancelled: () => cancelled,
        now: () => performance.now(),
      });
      return { ok: true, result };
    } catch (e) {
      if (e instanceof InvalidInputError) return { ok: false, kind: 'invalid', message: e.message, issues: e.issues };
      if (isSimulationStopped(e)) return { ok: false, kind: 'stopped', reason: e.reason, message: e.message, gridlock: e.gridlock };
      throw e;
    }
  },
  cancel() {
    cancelled = true;
  },
};

export type SimulationWorkerApi = typeof api;

Comlink.expose(api);
