// What the simulation worker offers over comlink, built as a plain object so it can be exercised
// over any message port (tests use a MessageChannel). run() resolves to an outcome object rather than
// rejecting, because an error crossing comlink keeps only its name and message, and the caller needs
// the field paths or the stop reason.
import type { RunResult } from '../../shared/results/run-result';
import { ENGINE_VERSION, InvalidInputError, isSimulationStopped, runExperiment, validateScenario, type GridlockEntry, type Progress, type StopReason, type ValidationIssue } from './index';

export type WorkerOutcome =
  | { ok: true; result: RunResult }
  | { ok: false; kind: 'invalid'; message: string; issues: ValidationIssue[] }
  | { ok: false; kind: 'stopped'; reason: StopReason; message: string; gridlock: GridlockEntry[] };

export function createWorkerApi(now: () => number) {
  let cancelled = false;
  return {
    engineVersion: () => ENGINE_VERSION,
    validateScenario: (doc: unknown) => validateScenario(doc),
    async run(scenario: unknown, settings: unknown, onProgress?: (p: Progress) => unknown): Promise<WorkerOutcome> {
      cancelled = false;
      try {
        const result = await runExperiment(scenario, settings, {
          onProgress: onProgress ? (p) => void onProgress(p) : undefined,
          isCancelled: () => cancelled,
          now,
        });
        return { ok: true, result };
      } catch (e) {
        if (e instanceof InvalidInputError) return { ok: false, kind: 'invalid', message: e.message, issues: e.issues };
        if (isSimulationStopped(e)) return { ok: false, kind: 'stopped', reason: e.reason, message: e.message, gridlock: e.gridlock };
        throw e;
      }
    },
    /** Stops the run in progress at its next slice (within about 50 ms). */
    cancel() {
      cancelled = true;
    },
  };
}

export type SimulationWorkerApi = ReturnType<typeof createWorkerApi>;
