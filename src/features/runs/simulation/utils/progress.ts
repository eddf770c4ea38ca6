// What the progress bar says: the engine reports simulated time over all replications; people
// want the replication they are in, how far it is, and how long the rest will take.
import type { Progress } from '../../../../../workers/engine';

export interface RunProgress {
  /** 1-based, for display. */
  replication: number;
  replications: number;
  /** Simulated time inside the current replication, warm-up included. */
  replicationSeconds: number;
  replicationLengthSeconds: number;
  fraction: number;
  elapsedMs: number;
  /** Null until enough of the run is done for the estimate to mean something. */
  remainingMs: number | null;
}

/** Below this share of the run, or this much wall time, an extrapolation swings too wildly to show. */
const MIN_FRACTION = 0.02;
const MIN_ELAPSED_MS = 500;

export function describeProgress(progress: Progress, elapsedMs: number): RunProgress {
  const replicationLengthSeconds = progress.totalSeconds / progress.replications;
  const fraction = Math.min(1, Math.max(0, progress.fraction));
  const replicationSeconds = Math.min(
    replicationLengthSeconds,
    Math.max(0, progress.simulatedSeconds - progress.replication * replicationLengthSeconds),
  );
  const estimable = fraction >= MIN_FRACTION && elapsedMs >= MIN_ELAPSED_MS;
  return {
    replication: progress.replication + 1,
    replications: progress.replications,
    replicationSeconds,
    replicationLengthSeconds,
    fraction,
    elapsedMs,
    remainingMs: estimable ? (elapsedMs * (1 - fraction)) / fraction : null,
  };
}

export { formatDuration } from '../../../../lib/format';
