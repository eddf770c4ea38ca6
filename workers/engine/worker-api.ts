// What the simulation worker offers over comlink, built as a plain object so it can be exercised
// over any message port (tests use a MessageChannel). run() resolves to an outcome object rather than
// rejecting, because an error crossing comlink keeps only its name and message, and the caller needs
// the field paths or the stop reason.
import type { PlaybackTrace } from '../../shared/results/playback';
import type { RunResult } from '../../shared/results/run-result';
import { ENGINE_VERSION, InvalidInputError, isSimulationStopped, recordPlayback, runExperiment, TraceLimitError, validateScenario, type GridlockEntry, type Progress, type StopReason, type ValidationIssue } from './index';

export type WorkerOutcome =
  | { ok: true; result: RunResult }
  | { ok: false; kind: 'invalid'; message: string; issues: ValidationIssue[] }
  | { ok: false; kind: 'stopped'; reason: StopReason; message: string; gridlock: GridlockEntry[] };

export type PlaybackOutcome =
  | { ok: true; trace: PlaybackTrace }
  | { ok: false; kind: 'invalid'; message: string; issues: ValidationIssue[] }
  | { ok: false; kind: 'stopped'; reason: StopReason; message: string; gridlock: GridlockEntry[] }
  | { ok: false; kind: 'tooLarge'; message: string };

/** The typed arrays of a trace, handed over to the page rather than copied. */
export function traceBuffers(trace: PlaybackTrace): ArrayBuffer[] {
  const columns = [...Object.values(trace.carriers), ...Object.values(trace.stations), trace.connFrom, trace.connTo];
  return columns.flatMap((c) => (ArrayBuffer.isView(c) ? [c.buffer as ArrayBuffer] : []));
}

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
    /** Replays one replication of a run and records a window of it for the player. */
    async playback(scenario: unknown, settings: unknown, request: unknown, onProgress?: (p: Progress) => unknown): Promise<PlaybackOutcome> {
      cancelled = false;
      try {
        const trace = await recordPlayback(scenario, settings, request, {
          onProgress: onProgress ? (p) => void onProgress(p) : undefined,
          isCancelled: () => cancelled,
          now,
        });
        return { ok: true, trace };
      } catch (e) {
        if (e instanceof InvalidInputError) return { ok: false, kind: 'invalid', message: e.message, issues: e.issues };
        if (e instanceof TraceLimitError) return { ok: false, kind: 'tooLarge', message: e.message };
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
