// The numbers of a comparison: each run's headline figures with their 95 % intervals, and every
// other run's difference from the first (the reference) with a 95 % interval on the difference.
// Runs with the same seed and replication count drew replication r from the same streams, so
// their differences are paired; otherwise the page says they are compared as independent samples.
import type { ReplicationResult, RunResult } from '../../../../shared/results/run-result';
import { pairedDifference, welchDifference, type MeanDifference } from '../../../../workers/analysis/compare-means';
import { studentT95 } from '../../../../workers/engine/stats/student-t';

export type MetricKey = 'throughputPerHour' | 'taktSeconds' | 'annualOutput' | 'wip' | 'leadTimeMinutes';

export interface Metric {
  key: MetricKey;
  label: string;
  unit: string;
  /** Whether a larger value is the better one (throughput) or the worse (takt, WIP, lead time). */
  higherIsBetter: boolean;
  decimals: number;
}

export const METRICS: readonly Metric[] = [
  { key: 'throughputPerHour', label: 'Throughput', unit: 'parts/h', higherIsBetter: true, decimals: 1 },
  { key: 'taktSeconds', label: 'Takt achieved', unit: 's', higherIsBetter: false, decimals: 2 },
  { key: 'annualOutput', label: 'Annual output', unit: 'parts', higherIsBetter: true, decimals: 0 },
  { key: 'wip', label: 'Work in progress', unit: 'parts', higherIsBetter: false, decimals: 2 },
  { key: 'leadTimeMinutes', label: 'Lead time', unit: 'min', higherIsBetter: false, decimals: 2 },
];

export interface ComparedRun {
  id: string;
  label: string;
  result: RunResult;
}

export type MetricInterval = { mean: number; ciLow: number; ciHigh: number };

export interface RunFigures {
  run: ComparedRun;
  values: Record<MetricKey, MetricInterval>;
  /** Difference from the reference run (null for the reference itself). */
  differences: Record<MetricKey, MeanDifference> | null;
}

export interface Comparison {
  figures: RunFigures[];
  /** 'paired' when every run shares the reference's seed and replication count. */
  pairing: 'paired' | 'independent';
  /** Why runs could not be paired, in words, or null. */
  pairingNote: string | null;
}

export const COMPARE_LIMITS = { min: 2, max: 4 } as const;

function samples(result: RunResult, key: MetricKey): number[] {
  const pick: Record<MetricKey, (r: ReplicationResult) => number> = {
    throughputPerHour: (r) => r.throughputPerHour,
    taktSeconds: (r) => r.taktSeconds,
    annualOutput: (r) => r.throughputPerHour * result.hoursPerYear,
    wip: (r) => r.wipMean,
    leadTimeMinutes: (r) => r.leadTimeMeanSeconds / 60,
  };
  return [...result.replications].sort((a, b) => a.replication - b.replication).map(pick[key]);
}

function intervalOf(result: RunResult, key: MetricKey): MetricInterval {
  if (key === 'throughputPerHour' || key === 'taktSeconds' || key === 'annualOutput') return result[key];
  const { mean, ciLow, ciHigh } = studentT95(samples(result, key));
  return { mean, ciLow, ciHigh };
}

const sameSeed = (a: RunResult, b: RunResult) => String(a.seed) === String(b.seed);

function pairingOf(runs: readonly ComparedRun[]): { pairing: Comparison['pairing']; note: string | null } {
  const [reference, ...others] = runs;
  const unlike = others.filter(
    (o) =>
      !sameSeed(o.result, reference.result) || o.result.replications.length !== reference.result.replications.length,
  );
  if (unlike.length === 0) return { pairing: 'paired', note: null };
  return {
    pairing: 'independent',
    note: `${unlike.map((o) => o.label).join(', ')} ${unlike.length === 1 ? 'was' : 'were'} run with another seed or replication count than ${reference.label}, so replications cannot be paired: differences use Welch’s interval for independent samples, which is wider. Run all of them with one seed to compare them with common random numbers.`,
  };
}

export function compareRuns(runs: readonly ComparedRun[]): Comparison {
  if (runs.length < COMPARE_LIMITS.min || runs.length > COMPARE_LIMITS.max) {
    throw new RangeError(
      `compareRuns: compare ${COMPARE_LIMITS.min} to ${COMPARE_LIMITS.max} runs (got ${runs.length})`,
    );
  }
  const { pairing, note } = pairingOf(runs);
  const reference = runs[0].result;
  const figures = runs.map((run, index) => {
    const values = Object.fromEntries(METRICS.map((m) => [m.key, intervalOf(run.result, m.key)])) as Record<
      MetricKey,
      MetricInterval
    >;
    const differences =
      index === 0
        ? null
        : (Object.fromEntries(
            METRICS.map((m) => {
              const a = samples(reference, m.key);
              const b = samples(run.result, m.key);
              return [m.key, pairing === 'paired' ? pairedDifference(a, b) : welchDifference(a, b)];
            }),
          ) as Record<MetricKey, MeanDifference>);
    return { run, values, differences };
  });
  return { figures, pairing, pairingNote: note };
}

/** Whether a difference is an improvement for this metric (the sign that counts as better). */
export const isBetter = (metric: Metric, difference: number) =>
  metric.higherIsBetter ? difference > 0 : difference < 0;
