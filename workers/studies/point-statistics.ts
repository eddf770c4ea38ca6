// Per point of a study: its replications' figures gathered from the job results, with means and 95 %
// Student t intervals (Law, Simulation Modeling and Analysis, 5th ed. 2015, §9.4.1), or the reason it
// has none (invalid, stopped, still running).
import type { JobResult, StudyDetail } from '../../shared/api/studies';
import type { ReplicationFigures } from '../../shared/studies/replication-summary-json';
import { studentT95, type ConfidenceInterval } from '../engine/stats';

export type PointState = 'done' | 'partial' | 'pending' | 'invalid' | 'stopped' | 'gridlock' | 'skipped';

/** Each state in a word or two, as tables and charts show it. */
export const POINT_STATE_WORDS: Record<PointState, string> = {
  done: 'done',
  partial: 'partly run',
  pending: 'waiting',
  invalid: 'not valid',
  stopped: 'stopped',
  gridlock: 'gridlock',
  skipped: 'not run',
};

/** A point that will never have figures: not valid, stopped, gridlocked or skipped. */
export const hasFailed = (state: PointState) =>
  state === 'invalid' || state === 'stopped' || state === 'gridlock' || state === 'skipped';

export type PointStatistics = {
  index: number;
  label: string;
  state: PointState;
  /** Why an invalid, stopped, gridlocked or skipped point has no figures. */
  message: string | null;
  /** Figures per replication, in replication order (index = replication number). */
  replications: (ReplicationFigures | undefined)[];
  throughput: ConfidenceInterval | null;
  wip: ConfidenceInterval | null;
  leadSeconds: ConfidenceInterval | null;
  /** Mean share of time each station (scenario order) was the bottleneck. */
  bottleneckShares: number[];
};

function pointState(jobs: JobResult[], jobsPerPoint: number): { state: PointState; message: string | null } {
  const failed = jobs.find((j) => j.outcome !== 'done');
  if (failed) return { state: failed.outcome as Exclude<JobResult['outcome'], 'done'>, message: failed.message };
  if (jobs.length === 0) return { state: 'pending', message: null };
  return { state: jobs.length >= jobsPerPoint ? 'done' : 'partial', message: null };
}

const interval = (values: number[]) => (values.length > 0 ? studentT95(values) : null);

export function pointStatistics(
  study: Pick<StudyDetail, 'points' | 'results' | 'settings' | 'blockSize'>,
): PointStatistics[] {
  const jobsPerPoint = Math.ceil(study.settings.replications / study.blockSize);
  return study.points.map((point) => {
    const jobs = study.results.filter((r) => r.pointIndex === point.index);
    const replications: (ReplicationFigures | undefined)[] = new Array(study.settings.replications).fill(undefined);
    for (const job of jobs) job.figures.forEach((f, k) => (replications[job.first + k] = f));
    const figures = replications.filter((f): f is ReplicationFigures => f !== undefined);
    const stations = figures[0]?.bottleneckShares.length ?? 0;
    return {
      index: point.index,
      label: point.label,
      ...pointState(jobs, jobsPerPoint),
      replications,
      throughput: interval(figures.map((f) => f.throughputPerHour)),
      wip: interval(figures.map((f) => f.wipMean)),
      leadSeconds: interval(figures.map((f) => f.leadMeanSeconds)),
      bottleneckShares: Array.from(
        { length: stations },
        (_, s) => figures.reduce((sum, f) => sum + f.bottleneckShares[s], 0) / figures.length,
      ),
    };
  });
}

/**
 * Paired 95 % interval of (b - a) over the replications both points finished. With common random
 * numbers replication r of every point draws from the same streams, so the pairs share their noise and
 * the interval on the differences is much narrower than two separate ones (Law 2015, §10.2.1).
 */
export function pairedDifference(
  a: PointStatistics,
  b: PointStatistics,
  pick: (f: ReplicationFigures) => number,
): ConfidenceInterval | null {
  const differences: number[] = [];
  a.replications.forEach((fa, r) => {
    const fb = b.replications[r];
    if (fa && fb) differences.push(pick(fb) - pick(fa));
  });
  return differences.length >= 2 ? studentT95(differences) : null;
}
