// What the simulation worker offers over comlink, built as a plain object so it can be exercised
// over any message port (tests use a MessageChannel). Calls resolve to outcome objects rather than
// rejecting, because an error crossing comlink keeps only its name and message, and the caller needs
// the field paths or the stop reason. One worker runs one call at a time; a pool of workers spreads
// the replications of a run, or the jobs of a study, over the cores.
import type { PlaybackTrace } from '../../shared/results/playback';
import type { RunResult } from '../../shared/results/run-result';
import { runStudyJob, type StudyJobInput, type StudyJobOutcome } from '../studies/run-study-job';
import {
  combineBlocks,
  ENGINE_VERSION,
  InvalidInputError,
  isSimulationStopped,
  recordPlayback,
  runExperiment,
  runReplicationRange,
  TraceLimitError,
  validateScenario,
  type GridlockEntry,
  type Progress,
  type ReplicationBlock,
  type ReplicationRange,
  type RunHooks,
  type StopReason,
  type ValidationIssue,
} from './index';

type Failure =
  | { ok: false; kind: 'invalid'; message: string; issues: ValidationIssue[] }
  | { ok: false; kind: 'stopped'; reason: StopReason; message: string; gridlock: GridlockEntry[] };

export type WorkerOutcome = { ok: true; result: RunResult } | Failure;
export type RangeOutcome = { ok: true; block: ReplicationBlock } | Failure;

function asFailure(e: unknown): Failure {
  if (e instanceof InvalidInputError) return { ok: false, kind: 'invalid', message: e.message, issues: e.issues };
  if (isSimulationStopped(e))
    return { ok: false, kind: 'stopped', reason: e.reason, message: e.message, gridlock: e.gridlock };
  throw e;
}

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

/**
 * Progress crosses to the page as a message, and the page wakes for each: the engine reports every
 * slice (about 50 ms), which is more often than a progress bar needs and costs the page's thread time
 * the other workers could use. So at most one report per interval passes, and the last one always.
 */
export const PROGRESS_INTERVAL_MS = 200;

function throttled(onProgress: (p: Progress) => unknown, now: () => number): (p: Progress) => void {
  let last = -Infinity;
  return (p) => {
    const t = now();
    if (t - last < PROGRESS_INTERVAL_MS && p.fraction < 1) return;
    last = t;
    void onProgress(p);
  };
}

export function createWorkerApi(now: () => number) {
  let cancelled = false;
  const hooks = (onProgress?: (p: Progress) => unknown): RunHooks => {
    cancelled = false;
    return { onProgress: onProgress ? throttled(onProgress, now) : undefined, isCancelled: () => cancelled, now };
  };
  return {
    engineVersion: () => ENGINE_VERSION,
    validateScenario: (doc: unknown) => validateScenario(doc),
    async run(scenario: unknown, settings: unknown, onProgress?: (p: Progress) => unknown): Promise<WorkerOutcome> {
      try {
        return { ok: true, result: await runExperiment(scenario, settings, hooks(onProgress)) };
      } catch (e) {
        return asFailure(e);
      }
    },
    /** One block of an experiment's replications; typed arrays travel by structured clone. */
    async runRange(
      scenario: unknown,
      settings: unknown,
      range: ReplicationRange,
      onProgress?: (p: Progress) => unknown,
    ): Promise<RangeOutcome> {
      try {
        return { ok: true, block: await runReplicationRange(scenario, settings, range, hooks(onProgress)) };
      } catch (e) {
        return asFailure(e);
      }
    },
    combine(scenario: unknown, settings: unknown, blocks: ReplicationBlock[]): WorkerOutcome {
      try {
        return { ok: true, result: combineBlocks(scenario, settings, blocks) };
      } catch (e) {
        return asFailure(e);
      }
    },
    runStudyJob(
      document: unknown,
      job: StudyJobInput,
      onProgress?: (p: Progress) => unknown,
    ): Promise<StudyJobOutcome> {
      return runStudyJob(document, job, hooks(onProgress));
    },
    /** Replays one replication of a run and records a window of it for the player. */
    async playback(
      scenario: unknown,
      settings: unknown,
      request: unknown,
      onProgress?: (p: Progress) => unknown,
    ): Promise<PlaybackOutcome> {
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
        if (isSimulationStopped(e))
          return { ok: false, kind: 'stopped', reason: e.reason, message: e.message, gridlock: e.gridlock };
        throw e;
      }
    },
    /** Stops the call in progress at its next slice (within about 50 ms). */
    cancel() {
      cancelled = true;
    },
  };
}

export type SimulationWorkerApi = ReturnType<typeof createWorkerApi>;
