// The samplers draw from the distributions they claim: sample moments agree with the exact moments,
// and a Kolmogorov–Smirnov test against jstat's reference CDFs passes at the 1 % level.
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import type { Distribution } from '../../shared/scenario/distribution';
import { distributionMean, distributionVariance } from '../../workers/engine/stats/distribution-moments';
import { createSampler } from '../../workers/engine/random/sampler';
import { createStreamFactory } from '../../workers/engine/random/streams';

type Cdf = (x: number, ...params: number[]) => number;
type JStatCdfs = Record<'normal' | 'lognormal' | 'exponential' | 'gamma' | 'uniform' | 'triangular', { cdf: Cdf }>;
const { jStat } = createRequire(import.meta.url)('jstat') as { jStat: JStatCdfs };

const DRAWS = 200_000;
const SEED = 'sampling-reference';

function draw(d: Distribution, key: string): Float64Array {
  const sample = createSampler(d, createStreamFactory(SEED, 1)(key));
  const values = new Float64Array(DRAWS);
  for (let i = 0; i < DRAWS; i++) values[i] = sample();
  return values;
}

function moments(values: Float64Array): { mean: number; variance: number; fourth: number } {
  let mean = 0;
  for (const v of values) mean += v;
  mean /= values.length;
  let second = 0;
  let fourth = 0;
  for (const v of values) {
    const d2 = (v - mean) ** 2;
    second += d2;
    fourth += d2 * d2;
  }
  return { mean, variance: second / (values.length - 1), fourth: fourth / values.length };
}

/** Largest gap between the empirical CDF and the reference CDF (Kolmogorov's D_n). */
function ksStatistic(values: Float64Array, cdf: (x: number) => number): number {
  const sorted = values.slice().sort();
  const n = sorted.length;
  let d = 0;
  for (let i = 0; i < n; i++) {
    const f = cdf(sorted[i]);
    d = Math.max(d, (i + 1) / n - f, f - i / n);
  }
  return d;
}

/** Critical value of D_n at α = 0.01 for large n: 1.63/√n (F. J. Massey, "The Kolmogorov-Smirnov test
 * for goodness of fit", JASA 46(253), 1951, Table 1, row "over 35"). */
const ksCritical = (n: number) => 1.63 / Math.sqrt(n);

const lognormalParams = (mean: number, cv: number) => {
  const sigma = Math.sqrt(Math.log(1 + cv * cv));
  return [Math.log(mean) - (sigma * sigma) / 2, sigma] as const;
};

const normalTruncated = { kind: 'normal', mean: 12, sd: 3, min: 10 } as const;
const truncatedCdf = (x: number) => {
  const below = jStat.normal.cdf(normalTruncated.min, normalTruncated.mean, normalTruncated.sd);
  return x < normalTruncated.min
    ? 0
    : (jStat.normal.cdf(x, normalTruncated.mean, normalTruncated.sd) - below) / (1 - below);
};

// Parameters are invented but typical: a 9 s press, a 12 ± 3 s manual fitting, MTBF of 10 min.
const cases: { name: string; d: Distribution; cdf?: (x: number) => number }[] = [
  { name: 'fixed', d: { kind: 'fixed', value: 4 } },
  { name: 'uniform', d: { kind: 'uniform', min: 2, max: 6 }, cdf: (x) => jStat.uniform.cdf(x, 2, 6) },
  // jStat.triangular.cdf takes (x, min, max, mode).
  {
    name: 'triangular',
    d: { kind: 'triangular', min: 8, mode: 9, max: 15 },
    cdf: (x) => jStat.triangular.cdf(x, 8, 15, 9),
  },
  // Eight standard deviations above zero: the truncation removes about 6e-16 of the mass.
  {
    name: 'normal (untruncated)',
    d: { kind: 'normal', mean: 12, sd: 1.5, min: 0 },
    cdf: (x) => jStat.normal.cdf(x, 12, 1.5),
  },
  { name: 'normal truncated at 10', d: normalTruncated, cdf: truncatedCdf },
  {
    name: 'lognormal',
    d: { kind: 'lognormal', mean: 9, cv: 0.3 },
    cdf: (x) => jStat.lognormal.cdf(x, ...lognormalParams(9, 0.3)),
  },
  // jStat.exponential.cdf takes the rate.
  { name: 'exponential', d: { kind: 'exponential', mean: 600 }, cdf: (x) => jStat.exponential.cdf(x, 1 / 600) },
  // jStat.gamma.cdf takes (x, shape, scale); Erlang-k is gamma with integer shape k.
  { name: 'erlang', d: { kind: 'erlang', mean: 12, k: 3 }, cdf: (x) => jStat.gamma.cdf(x, 3, 4) },
  { name: 'gamma, shape 16', d: { kind: 'gamma', mean: 4, cv: 0.25 }, cdf: (x) => jStat.gamma.cdf(x, 16, 0.25) },
  {
    name: 'gamma, shape below 1',
    d: { kind: 'gamma', mean: 4, cv: 1.6 },
    cdf: (x) => jStat.gamma.cdf(x, 1 / 1.6 ** 2, 4 * 1.6 ** 2),
  },
  { name: 'empirical', d: { kind: 'empirical', samples: [7.9, 8.4, 8.4, 9.1, 10.6, 12.2, 8.8, 0] } },
];

describe('samplers against the exact moments', () => {
  it.each(cases)('$name: sample mean and variance lie within five standard errors', ({ name, d }) => {
    const m = moments(draw(d, name));
    const mean = distributionMean(d);
    const variance = distributionVariance(d);
    // Standard error of a mean is σ/√n; of a sample variance √((μ4 − σ⁴)/n), with μ4 estimated from the
    // sample (H. Cramér, "Mathematical Methods of Statistics", 1946, §27.4; recalled from memory).
    // Five standard errors: a correct sampler fails by chance less than once in a million runs.
    const meanTolerance = 5 * Math.sqrt(variance / DRAWS) + 1e-12 * Math.abs(mean);
    const varianceTolerance = 5 * Math.sqrt(Math.max(m.fourth - m.variance ** 2, 0) / DRAWS) + 1e-12 * variance;
    expect(Math.abs(m.mean - mean)).toBeLessThanOrEqual(meanTolerance);
    expect(Math.abs(m.variance - variance)).toBeLessThanOrEqual(varianceTolerance);
  });

  it('empirical draws only ever return one of the measured times', () => {
    const samples = [7.9, 8.4, 9.1, 10.6];
    const allowed = new Set(samples);
    const values = draw({ kind: 'empirical', samples }, 'empirical-membership');
    expect(values.every((v) => allowed.has(v))).toBe(true);
    expect(new Set(values).size).toBe(samples.length);
  });

  it('a truncated normal never draws below its min', () => {
    const lowest = draw(normalTruncated, 'truncated-floor').reduce((a, b) => Math.min(a, b));
    expect(lowest).toBeGreaterThanOrEqual(normalTruncated.min);
  });
});

describe('samplers against jstat reference CDFs (one-sample Kolmogorov–Smirnov, α = 0.01)', () => {
  it.each(cases.filter((c) => c.cdf))('$name passes', ({ name, d, cdf }) => {
    expect(ksStatistic(draw(d, name), cdf!)).toBeLessThan(ksCritical(DRAWS));
  });

  it('the test has power: a gamma sampler checked against the wrong shape fails', () => {
    const values = draw({ kind: 'gamma', mean: 4, cv: 0.25 }, 'power');
    expect(ksStatistic(values, (x) => jStat.gamma.cdf(x, 14, 4 / 14))).toBeGreaterThan(ksCritical(DRAWS));
  });
});
