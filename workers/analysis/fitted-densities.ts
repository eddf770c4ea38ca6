// Density and distribution functions of the three candidate families, in the parameters the fits
// produce. The Kolmogorov–Smirnov check uses the CDFs; the client draws the densities over the histogram.
import type { FittedCandidate } from '../../shared/api/time-studies';
import {
  lnGamma,
  regularizedLowerGamma,
  standardNormalCdf,
  standardNormalPdf,
} from '../engine/stats/special-functions';

export interface FittedLaw {
  pdf: (x: number) => number;
  cdf: (x: number) => number;
}

export function normalLaw(mean: number, sd: number): FittedLaw {
  return {
    pdf: (x) => standardNormalPdf((x - mean) / sd) / sd,
    cdf: (x) => standardNormalCdf((x - mean) / sd),
  };
}

/** ln X ~ N(mu, sigma²). */
export function lognormalLaw(mu: number, sigma: number): FittedLaw {
  return {
    pdf: (x) => (x > 0 ? standardNormalPdf((Math.log(x) - mu) / sigma) / (sigma * x) : 0),
    cdf: (x) => (x > 0 ? standardNormalCdf((Math.log(x) - mu) / sigma) : 0),
  };
}

/** Shape k and scale θ: mean kθ, variance kθ². */
export function gammaLaw(shape: number, scale: number): FittedLaw {
  const lnNorm = lnGamma(shape) + shape * Math.log(scale);
  return {
    pdf: (x) =>
      x > 0 ? Math.exp((shape - 1) * Math.log(x) - x / scale - lnNorm) : x === 0 && shape === 1 ? 1 / scale : 0,
    cdf: (x) => regularizedLowerGamma(shape, x / scale),
  };
}

export function lawOf(candidate: FittedCandidate): FittedLaw {
  switch (candidate.kind) {
    case 'normal':
      return normalLaw(candidate.parameters.mean, candidate.parameters.sd);
    case 'lognormal':
      return lognormalLaw(candidate.parameters.mu, candidate.parameters.sigma);
    case 'gamma':
      return gammaLaw(candidate.parameters.shape, candidate.parameters.scale);
  }
}
