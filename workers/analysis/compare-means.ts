// Confidence intervals on the difference of two scenarios' means across replications. When both were
// run with the same seed and replication count, replication r of each drew from the same streams
// (common random numbers), so the pairs are correlated and the paired-t interval on the differences
// is the right one (Law, "Simulation Modeling and Analysis", 5th ed. 2015, §10.2.1). Otherwise the
// samples are independent and Welch's approximate t interval applies (same section, §10.2.2, with
// the Welch–Satterthwaite degrees of freedom).
import { tQuantile } from '../engine/stats/student-t';

export type DifferenceMethod = 'paired' | 'welch';

export type MeanDifference = {
  method: DifferenceMethod;
  /** Mean of b minus mean of a. */
  difference: number;
  ciLow: number;
  ciHigh: number;
  halfWidth: number;
  degreesOfFreedom: number;
  /** True when the 95 % interval excludes zero. */
  significant: boolean;
  /** Why no interval could be formed (fewer than two replications), or null. */
  unavailable: string | null;
};

function mean(xs: readonly number[]): number {
  let sum = 0;
  for (const x of xs) sum += x;
  return sum / xs.length;
}

function sampleVariance(xs: readonly number[], m: number): number {
  let squares = 0;
  for (const x of xs) squares += (x - m) * (x - m);
  return squares / (xs.length - 1);
}

function interval(method: DifferenceMethod, difference: number, standardError: number, df: number): MeanDifference {
  if (standardError === 0) {
    // No spread at all (deterministic lines): the difference is exact, significant unless zero.
    return {
      method,
      difference,
      ciLow: difference,
      ciHigh: difference,
      halfWidth: 0,
      degreesOfFreedom: df,
      significant: difference !== 0,
      unavailable: null,
    };
  }
  const halfWidth = tQuantile(0.975, df) * standardError;
  const ciLow = difference - halfWidth;
  const ciHigh = difference + halfWidth;
  return {
    method,
    difference,
    ciLow,
    ciHigh,
    halfWidth,
    degreesOfFreedom: df,
    significant: ciLow > 0 || ciHigh < 0,
    unavailable: null,
  };
}

function tooFew(method: DifferenceMethod, difference: number): MeanDifference {
  return {
    method,
    difference,
    ciLow: Number.NaN,
    ciHigh: Number.NaN,
    halfWidth: Number.NaN,
    degreesOfFreedom: 0,
    significant: false,
    unavailable: 'an interval needs at least two replications of each run',
  };
}

/** Paired-t interval on b − a; a[i] and b[i] come from the same replication index (same streams). */
export function pairedDifference(a: readonly number[], b: readonly number[]): MeanDifference {
  if (a.length !== b.length)
    throw new RangeError(
      `pairedDifference: both samples need one value per replication (got ${a.length} and ${b.length})`,
    );
  if (a.length === 0) throw new RangeError('pairedDifference: needs at least one replication');
  const differences = a.map((x, i) => b[i] - x);
  const d = mean(differences);
  const n = differences.length;
  if (n < 2) return tooFew('paired', d);
  return interval('paired', d, Math.sqrt(sampleVariance(differences, d) / n), n - 1);
}

/** Welch interval on mean(b) − mean(a) for independent samples of possibly different sizes. */
export function welchDifference(a: readonly number[], b: readonly number[]): MeanDifference {
  if (a.length === 0 || b.length === 0)
    throw new RangeError('welchDifference: needs at least one replication of each run');
  const ma = mean(a);
  const mb = mean(b);
  if (a.length < 2 || b.length < 2) return tooFew('welch', mb - ma);
  const va = sampleVariance(a, ma) / a.length;
  const vb = sampleVariance(b, mb) / b.length;
  const se2 = va + vb;
  // Welch–Satterthwaite; with both variances zero the df is irrelevant (the interval has no width).
  const df =
    se2 === 0 ? a.length + b.length - 2 : (se2 * se2) / ((va * va) / (a.length - 1) + (vb * vb) / (b.length - 1));
  return interval('welch', mb - ma, Math.sqrt(se2), df);
}
