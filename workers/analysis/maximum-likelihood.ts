// Maximum-likelihood estimates of the three candidate families from a time study's samples. Each returns
// its parameters, or a refusal that says why the family cannot describe these samples.
import { lognormalMeanCv } from '../../shared/scenario/distribution-parameters';
import { digamma, trigamma } from '../engine/stats/special-functions';
import { mean, sumOfSquares } from './describe-samples';

export type Estimate<P> = { ok: true; parameters: P } | { ok: false; reason: string };

export interface NormalParameters {
  mean: number;
  sd: number;
}
export interface LognormalParameters {
  mu: number;
  sigma: number;
  mean: number;
  cv: number;
}
export interface GammaParameters {
  shape: number;
  scale: number;
  mean: number;
  cv: number;
}

function spreadProblem(samples: readonly number[]): string | null {
  if (samples.length < 2) return `needs at least two measured times; the study has ${samples.length}`;
  const first = samples[0];
  if (samples.every((v) => v === first))
    return `needs at least two different times; every sample is ${first} s, which is better given as a fixed time`;
  return null;
}

function positivityProblem(family: string, samples: readonly number[]): string | null {
  let bad = 0;
  let smallest = Number.POSITIVE_INFINITY;
  for (const v of samples) {
    if (v <= 0) bad += 1;
    smallest = Math.min(smallest, v);
  }
  if (bad === 0) return null;
  return `a ${family} distribution has only positive values, but ${bad} of ${samples.length} samples are zero or below (the smallest is ${smallest} s)`;
}

/** Normal MLE: the sample mean and the standard deviation with the n denominator. */
export function fitNormal(samples: readonly number[]): Estimate<NormalParameters> {
  const problem = spreadProblem(samples);
  if (problem) return { ok: false, reason: problem };
  const m = mean(samples);
  return { ok: true, parameters: { mean: m, sd: Math.sqrt(sumOfSquares(samples, m) / samples.length) } };
}

/**
 * Lognormal MLE: the normal MLE of the logarithms, μ̂ = mean(ln x), σ̂² = Σ(ln x − μ̂)²/n; reported also as
 * the distribution's own mean exp(μ + σ²/2) and cv √(exp(σ²) − 1) (Johnson, Kotz & Balakrishnan,
 * Continuous Univariate Distributions vol. 1, 2nd ed. 1994, ch. 14).
 */
export function fitLognormal(samples: readonly number[]): Estimate<LognormalParameters> {
  const problem = positivityProblem('lognormal', samples) ?? spreadProblem(samples);
  if (problem) return { ok: false, reason: problem };
  const logs = samples.map(Math.log);
  const mu = mean(logs);
  const sigma = Math.sqrt(sumOfSquares(logs, mu) / logs.length);
  return { ok: true, parameters: { mu, sigma, ...lognormalMeanCv(mu, sigma) } };
}

const NEWTON_MAX_STEPS = 100;
const NEWTON_TOLERANCE = 1e-12;

/**
 * Gamma MLE. The scale's estimate is mean/k, which leaves one equation in the shape k:
 * ln k − ψ(k) = s with s = ln(mean) − mean(ln x) > 0. It is solved by Newton's method from the closed-form
 * starting value k₀ = (3 − s + √((s − 3)² + 24 s)) / (12 s) (T. P. Minka, "Estimating a Gamma
 * distribution", 2002, eq. 6; also Choi & Wette, Technometrics 11, 1969). ln k − ψ(k) is convex and
 * decreasing, so Newton's steps converge quickly from k₀; a step that would make k zero or negative
 * halves k instead.
 */
export function fitGamma(samples: readonly number[]): Estimate<GammaParameters> {
  const problem = positivityProblem('gamma', samples) ?? spreadProblem(samples);
  if (problem) return { ok: false, reason: problem };
  const m = mean(samples);
  const s = Math.log(m) - mean(samples.map(Math.log));
  if (!(s > 0))
    return {
      ok: false,
      reason: 'the samples are too close together for the shape to be estimated in double precision',
    };
  let k = (3 - s + Math.sqrt((s - 3) * (s - 3) + 24 * s)) / (12 * s);
  for (let step = 0; step < NEWTON_MAX_STEPS; step += 1) {
    const f = Math.log(k) - digamma(k) - s;
    const slope = 1 / k - trigamma(k);
    let next = k - f / slope;
    if (!(next > 0)) next = k / 2;
    const converged = Math.abs(next - k) <= NEWTON_TOLERANCE * k;
    k = next;
    if (converged) break;
  }
  return { ok: true, parameters: { shape: k, scale: m / k, mean: m, cv: 1 / Math.sqrt(k) } };
}
