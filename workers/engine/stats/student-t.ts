// Student t quantiles and the two-sided 95 % confidence interval of a mean across replications, the
// interval every run reports for throughput and takt (Law, "Simulation Modeling and Analysis", 5th ed.
// 2015, §9.4.1: replications are independent, so the t interval on their means is valid).
import { lnGamma, regularizedBeta } from './special-functions';

/** P(T > t) for t >= 0 with df degrees of freedom, through the incomplete beta function
 * (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, §26.7). */
function upperTail(t: number, df: number): number {
  return 0.5 * regularizedBeta(df / (df + t * t), df / 2, 0.5);
}

function density(t: number, df: number): number {
  const logNorm = lnGamma((df + 1) / 2) - lnGamma(df / 2) - 0.5 * Math.log(df * Math.PI);
  return Math.exp(logNorm - ((df + 1) / 2) * Math.log1p((t * t) / df));
}

const MAX_ITERATIONS = 200;

/** Quantile of Student's t: the t with P(T <= t) = p. df may be fractional; p in (0, 1). */
export function tQuantile(p: number, df: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`tQuantile: p must lie strictly between 0 and 1, got ${p}`);
  if (!(df > 0) || !Number.isFinite(df))
    throw new RangeError(`tQuantile: df must be a positive finite number, got ${df}`);
  if (p < 0.5) return -tQuantile(1 - p, df);
  if (p === 0.5) return 0;
  // Closed forms (Cauchy for df = 1; Hill, CACM 13(10), 1970, for df = 2).
  if (df === 1) return Math.tan(Math.PI * (p - 0.5));
  if (df === 2) return (2 * p - 1) / Math.sqrt(2 * p * (1 - p));
  const tail = 1 - p;
  // Bracket the root, then Newton steps kept inside the bracket (bisection when a step leaves it).
  let low = 0;
  let high = 1;
  while (upperTail(high, df) > tail) {
    low = high;
    high *= 2;
  }
  let t = (low + high) / 2;
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    const excess = upperTail(t, df) - tail;
    if (excess > 0) low = t;
    else high = t;
    const newton = t + excess / density(t, df);
    const next = newton > low && newton < high ? newton : (low + high) / 2;
    if (Math.abs(next - t) <= 1e-14 * Math.max(1, Math.abs(t))) return next;
    t = next;
  }
  return t;
}

export type ConfidenceInterval = {
  mean: number;
  ciLow: number;
  ciHigh: number;
  halfWidth: number;
  /** Number of samples; with n = 1 the interval has zero width because no spread can be estimated. */
  n: number;
};

export function studentT95(samples: readonly number[]): ConfidenceInterval {
  const n = samples.length;
  if (n === 0) throw new RangeError('studentT95: needs at least one sample (one value per replication)');
  let mean = 0;
  for (const s of samples) mean += s;
  mean /= n;
  if (n === 1) return { mean, ciLow: mean, ciHigh: mean, halfWidth: 0, n };
  let squares = 0;
  for (const s of samples) squares += (s - mean) * (s - mean);
  const halfWidth = tQuantile(0.975, n - 1) * Math.sqrt(squares / (n - 1) / n);
  return { mean, ciLow: mean - halfWidth, ciHigh: mean + halfWidth, halfWidth, n };
}
