// The one place where a distribution's stated parameters turn into the numbers the formulas use: the
// mean a user gives for each kind, and the mean/cv form of the lognormal and gamma against their
// textbook parameters (Johnson, Kotz & Balakrishnan, Continuous Univariate Distributions vol. 1, 2nd
// ed. 1994, ch. 14 and 17). The engine's samplers, the exact moments, the editor's preview and the
// time-study fits all convert through here.
import type { Distribution } from './distribution';

/**
 * The mean as the user states it. For every kind but the normal this is the distribution's mean; a
 * normal truncated below `min` has a slightly larger one (workers/engine/stats/distribution-moments.ts).
 */
export function statedMean(d: Distribution): number {
  switch (d.kind) {
    case 'fixed':
      return d.value;
    case 'uniform':
      return (d.min + d.max) / 2;
    case 'triangular':
      return (d.min + d.mode + d.max) / 3;
    case 'normal':
    case 'lognormal':
    case 'exponential':
    case 'erlang':
    case 'gamma':
      return d.mean;
    case 'empirical': {
      let sum = 0;
      for (const s of d.samples) sum += s;
      return sum / d.samples.length;
    }
  }
}

/** ln X ~ N(mu, sigma²) with E[X] = mean and sd(X)/E[X] = cv: sigma² = ln(1 + cv²), mu = ln mean − sigma²/2. */
export function lognormalFromMeanCv(mean: number, cv: number): { mu: number; sigma: number } {
  const sigma = Math.sqrt(Math.log(1 + cv * cv));
  return { mu: Math.log(mean) - (sigma * sigma) / 2, sigma };
}

/** The inverse: mean exp(mu + sigma²/2) and cv √(exp(sigma²) − 1). */
export function lognormalMeanCv(mu: number, sigma: number): { mean: number; cv: number } {
  return { mean: Math.exp(mu + (sigma * sigma) / 2), cv: Math.sqrt(Math.expm1(sigma * sigma)) };
}

/** Gamma with shape k and scale θ: mean kθ and cv 1/√k, so k = 1/cv² and θ = mean/k. */
export function gammaFromMeanCv(mean: number, cv: number): { shape: number; scale: number } {
  const shape = 1 / (cv * cv);
  return { shape, scale: mean / shape };
}
