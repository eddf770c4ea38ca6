// Runs an experiment through the engine's public facade with a host that never waits between
// slices, and forms confidence intervals on per-replication values for the reference checks.
import type { RunResult } from '../../../shared/results/run-result';
import type { RunSettingsInput } from '../../../shared/scenario/run-settings';
import { runExperiment } from '../../../workers/engine/index';
import { tQuantile } from '../../../workers/engine/stats/student-t';

export function simulate(scenario: unknown, settings: RunSettingsInput, checkInvariants = false): Promise<RunResult> {
  return runExperiment(scenario, settings, {
    now: () => performance.now(),
    yieldToHost: async () => undefined,
    checkInvariants,
  });
}

export type Interval = { mean: number; low: number; high: number; halfWidth: number };

/**
 * Two-sided Student t interval of the mean of independent replications at the given confidence
 * (Law, "Simulation Modeling and Analysis", 5th ed. 2015, §9.4.1). Several checks in one family use
 * the Bonferroni level 1 − 0.05/k each, so that the whole family holds at 95 % (Law 2015, §10.4.1;
 * section recalled from memory).
 */
export function interval(values: readonly number[], confidence = 0.95): Interval {
  const n = values.length;
  if (n < 2) throw new RangeError('an interval needs at least two replications');
  const mean = values.reduce((a, b) => a + b, 0) / n;
  const variance = values.reduce((a, b) => a + (b - mean) ** 2, 0) / (n - 1);
  const halfWidth = tQuantile(1 - (1 - confidence) / 2, n - 1) * Math.sqrt(variance / n);
  return { mean, low: mean - halfWidth, high: mean + halfWidth, halfWidth };
}

export const replicationThroughputs = (r: RunResult): number[] => r.replications.map((x) => x.throughputPerHour);
