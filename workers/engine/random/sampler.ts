// Turns a validated scenario distribution and a uniform stream into a draw function for the hot
// path. Each closure keeps its constants precomputed and allocates nothing per draw. Inputs are
// trusted: distributionSchema has already refused anything these formulas cannot take.
import type { Distribution } from '../../../shared/scenario/distribution';
import { gammaFromMeanCv, lognormalFromMeanCv } from '../../../shared/scenario/distribution-parameters';
import type { UniformStream } from './streams';

export type Sampler = () => number;

/** Redraws allowed before a truncated normal gives up and returns its lower bound. The schema keeps
 * min at or below the mean, so each draw is accepted with probability at least 1/2 and the bound is
 * reached about once in 2^32 draws. */
const TRUNCATION_TRIES = 32;

/** Standard normal draws by the Box–Muller transform (Box & Muller, Ann. Math. Statist. 29, 1958),
 * keeping the second variate of each pair in the closure rather than in an array. */
export function standardNormal(u: UniformStream): Sampler {
  let spare = 0;
  let hasSpare = false;
  return () => {
    if (hasSpare) {
      hasSpare = false;
      return spare;
    }
    const radius = Math.sqrt(-2 * Math.log(1 - u()));
    const angle = 2 * Math.PI * u();
    spare = radius * Math.sin(angle);
    hasSpare = true;
    return radius * Math.cos(angle);
  };
}

/** Gamma(shape, scale) by Marsaglia & Tsang ("A simple method for generating gamma variables",
 * ACM TOMS 26(3), 2000), with their boost for shape < 1: draw Gamma(shape + 1) and multiply by U^(1/shape). */
export function gammaSampler(shape: number, scale: number, u: UniformStream): Sampler {
  const boosted = shape < 1;
  const d = (boosted ? shape + 1 : shape) - 1 / 3;
  const c = 1 / Math.sqrt(9 * d);
  const inverseShape = 1 / shape;
  const normal = standardNormal(u);
  return () => {
    let draw: number;
    for (;;) {
      const x = normal();
      let v = 1 + c * x;
      if (v <= 0) continue;
      v = v * v * v;
      const w = u();
      const x2 = x * x;
      if (w < 1 - 0.0331 * x2 * x2 || Math.log(w) < 0.5 * x2 + d * (1 - v + Math.log(v))) {
        draw = d * v;
        break;
      }
    }
    if (boosted) draw *= Math.pow(u(), inverseShape);
    return draw * scale;
  };
}

function truncatedNormal(mean: number, sd: number, min: number, u: UniformStream): Sampler {
  const normal = standardNormal(u);
  return () => {
    for (let i = 0; i < TRUNCATION_TRIES; i++) {
      const x = mean + sd * normal();
      if (x >= min) return x;
    }
    return min;
  };
}

function triangular(min: number, mode: number, max: number, u: UniformStream): Sampler {
  const range = max - min;
  const split = (mode - min) / range;
  const lower = range * (mode - min);
  const upper = range * (max - mode);
  // Inverse CDF of the triangular distribution, one uniform per draw.
  return () => {
    const p = u();
    return p < split ? min + Math.sqrt(p * lower) : max - Math.sqrt((1 - p) * upper);
  };
}

function erlang(mean: number, k: number, u: UniformStream): Sampler {
  const phaseMean = mean / k;
  // The product of k uniforms stays far above the double underflow limit for k <= 100 (schema limit).
  return () => {
    let product = 1;
    for (let i = 0; i < k; i++) product *= 1 - u();
    return -phaseMean * Math.log(product);
  };
}

export function createSampler(d: Distribution, u: UniformStream): Sampler {
  switch (d.kind) {
    case 'fixed': {
      const value = d.value;
      return () => value;
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
      const normal = standardNormal(u);
      return () => Math.exp(mu + sigma * normal());
    }
    case 'exponential': {
      const { mean } = d;
      return () => -mean * Math.log(1 - u());
    }
    case 'erlang':
      return erlang(d.mean, d.k, u);
    case 'gamma': {
      const { shape, scale } = gammaFromMeanCv(d.mean, d.cv);
      return gammaSampler(shape, scale, u);
    }
    case 'empirical': {
      const samples = Float64Array.from(d.samples);
      const n = samples.length;
      return () => samples[Math.floor(u() * n)];
    }
  }
}
