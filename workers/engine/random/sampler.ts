// Turns a validated scenario distribution and a uniform stream into a draw function for the hot
// path. Every draw of every kind takes exactly one uniform from its stream, by inverse transform
// (a fixed time takes one too and ignores it). Two scenarios run with the same seed therefore use the
// same uniform for the n-th operation of a station whatever the other draws were: common random
// numbers stay in step, and a change of a station's mean moves its times monotonically rather than
// reshuffling them. Each closure keeps its constants precomputed and allocates nothing per draw.
// Inputs are trusted: distributionSchema has already refused anything these formulas cannot take.
import type { Distribution } from '../../../shared/scenario/distribution';
import {
  inverseRegularizedLowerGamma,
  lnGamma,
  normalQuantileFast,
  standardNormalCdf,
} from '../stats/special-functions';
import { gammaFromMeanCv, lognormalFromMeanCv } from '../../../shared/scenario/distribution-parameters';
import type { UniformStream } from './streams';

export type Sampler = () => number;

/** Half a step of the 2^-32 grid the streams draw on: u + HALF_STEP lies strictly inside (0, 1), so
 * quantile functions with infinite tails stay finite. */
const HALF_STEP = 2 ** -33;

/** Normal truncated below at min: the upper tail beyond the cut is mapped onto one uniform. */
function truncatedNormal(mean: number, sd: number, min: number, u: UniformStream): Sampler {
  // Working with upper-tail probabilities keeps precision: the share kept above the cut is at least 1/2.
  const kept = standardNormalCdf((mean - min) / sd);
  return () => {
    const x = mean - sd * normalQuantileFast((1 - u()) * kept);
    return x > min ? x : min;
  };
}

function triangular(min: number, mode: number, max: number, u: UniformStream): Sampler {
  const range = max - min;
  const split = (mode - min) / range;
  const lower = range * (mode - min);
  const upper = range * (max - mode);
  return () => {
    const p = u();
    return p < split ? min + Math.sqrt(p * lower) : max - Math.sqrt((1 - p) * upper);
  };
}

/** Gamma(shape, scale) by inverting its CDF, the regularised incomplete gamma function. */
function gamma(shape: number, scale: number, u: UniformStream): Sampler {
  const lnGammaShape = lnGamma(shape);
  return () => scale * inverseRegularizedLowerGamma(shape, u() + HALF_STEP, lnGammaShape);
}

export function createSampler(d: Distribution, u: UniformStream): Sampler {
  switch (d.kind) {
    case 'fixed': {
      const value = d.value;
      return () => {
        u();
        return value;
      };
    }
    case 'uniform': {
      const { min } = d;
      const width = d.max - d.min;
      return () => min + width * u();
    }
    case 'triangular':
      return triangular(d.min, d.mode, d.max, u);
    case 'normal':
      return truncatedNormal(d.mean, d.sd, d.min, u);
    case 'lognormal': {
      // Underlying normal chosen so the lognormal has the given mean and coefficient of variation.
      const { mu, sigma } = lognormalFromMeanCv(d.mean, d.cv);
      return () => Math.exp(mu + sigma * normalQuantileFast(u() + HALF_STEP));
    }
    case 'exponential': {
      const { mean } = d;
      return () => -mean * Math.log(1 - u());
    }
    case 'erlang':
      return gamma(d.k, d.mean / d.k, u);
    case 'gamma': {
      const { shape, scale } = gammaFromMeanCv(d.mean, d.cv);
      return gamma(shape, scale, u);
    }
    case 'empirical': {
      const samples = Float64Array.from(d.samples);
      const n = samples.length;
      return () => samples[Math.floor(u() * n)];
    }
  }
}
