// Exact mean and variance of every scenario distribution as the engine samples it (a normal is
// truncated below its min by redrawing; empirical samples are drawn uniformly), so the client can draw
// the line-balance chart (cycle time against takt) without sampling.
import type { Distribution } from '../../../shared/scenario/distribution';
import { statedMean } from '../../../shared/scenario/distribution-parameters';
import { standardNormalCdf, standardNormalPdf } from './special-functions';

/** Beyond ten standard deviations the truncation moves the moments by less than 1e-20 of sd. */
const TRUNCATION_NEGLIGIBLE = -10;

/**
 * Moments of a normal truncated below at min (Johnson, Kotz & Balakrishnan, Continuous Univariate
 * Distributions vol. 1, 2nd ed. 1994, ch. 13 on truncated normals; chapter recalled from memory):
 * with a = (min - mean)/sd and h = pdf(a)/(1 - cdf(a)), mean + sd*h and sd^2 * (1 + a*h - h^2).
 */
function truncatedNormalMoments(mean: number, sd: number, min: number): [number, number] {
  const a = (min - mean) / sd;
  if (a < TRUNCATION_NEGLIGIBLE) return [mean, sd * sd];
  const h = standardNormalPdf(a) / standardNormalCdf(-a);
  return [mean + sd * h, sd * sd * (1 + a * h - h * h)];
}

/** Sampling draws uniformly from the stored samples, so their population variance is exact. */
function sampleVariance(samples: readonly number[], mean: number): number {
  let squares = 0;
  for (const s of samples) squares += (s - mean) * (s - mean);
  return squares / samples.length;
}

export function distributionMean(d: Distribution): number {
  return d.kind === 'normal' ? truncatedNormalMoments(d.mean, d.sd, d.min)[0] : statedMean(d);
}

export function distributionVariance(d: Distribution): number {
  switch (d.kind) {
    case 'fixed':
      return 0;
    case 'uniform':
      return ((d.max - d.min) * (d.max - d.min)) / 12;
    case 'triangular': {
      const { min: a, mode: c, max: b } = d;
      return (a * a + b * b + c * c - a * b - a * c - b * c) / 18;
    }
    case 'normal':
      return truncatedNormalMoments(d.mean, d.sd, d.min)[1];
    case 'lognormal':
    case 'gamma':
      return (d.mean * d.cv) ** 2;
    case 'exponential':
      return d.mean * d.mean;
    case 'erlang':
      return (d.mean * d.mean) / d.k;
    case 'empirical':
      return sampleVariance(d.samples, statedMean(d));
  }
}
