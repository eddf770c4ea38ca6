// The exact moments the line-balance chart draws agree with jstat's closed forms and, for the
// truncated normal, with a numerical integration of jstat's normal density.
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import type { Distribution } from '../../shared/scenario/distribution';
import { distributionMean, distributionVariance } from '../../workers/engine/stats/distribution-moments';

type Moments = { mean: (...p: number[]) => number; variance: (...p: number[]) => number };
type JStatMoments = Record<'lognormal' | 'gamma' | 'triangular' | 'uniform' | 'exponential', Moments> & {
  normal: {
    pdf: (x: number, mean: number, sd: number) => number;
    cdf: (x: number, mean: number, sd: number) => number;
  };
};
const { jStat } = createRequire(import.meta.url)('jstat') as { jStat: JStatMoments };

/** Agreement to 1e-12 relative: both sides are closed forms, only rounding separates them. */
function expectMoments(d: Distribution, mean: number, variance: number): void {
  expect(Math.abs(distributionMean(d) - mean)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(mean)));
  expect(Math.abs(distributionVariance(d) - variance)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(variance)));
}

/** Composite Simpson rule (Burden & Faires, "Numerical Analysis", 9th ed. 2010, §4.4). */
function simpson(f: (x: number) => number, a: number, b: number, intervals = 20_000): number {
  const h = (b - a) / intervals;
  let sum = f(a) + f(b);
  for (let i = 1; i < intervals; i++) sum += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (sum * h) / 3;
}

describe('distribution moments against jstat', () => {
  it('uniform', () => {
    expectMoments({ kind: 'uniform', min: 2, max: 6 }, jStat.uniform.mean(2, 6), jStat.uniform.variance(2, 6));
  });

  it('triangular (jstat order: min, max, mode)', () => {
    const d = { kind: 'triangular', min: 8, mode: 9, max: 15 } as const;
    expectMoments(d, jStat.triangular.mean(8, 15, 9), jStat.triangular.variance(8, 15, 9));
  });

  it('lognormal given by mean and cv', () => {
    const sigma = Math.sqrt(Math.log(1 + 0.3 ** 2));
    const mu = Math.log(9) - sigma ** 2 / 2;
    expectMoments(
      { kind: 'lognormal', mean: 9, cv: 0.3 },
      jStat.lognormal.mean(mu, sigma),
      jStat.lognormal.variance(mu, sigma),
    );
  });

  it('exponential (jstat takes the rate)', () => {
    const d = { kind: 'exponential', mean: 600 } as const;
    expectMoments(d, jStat.exponential.mean(1 / 600), jStat.exponential.variance(1 / 600));
  });

  it('gamma given by mean and cv, and erlang as gamma with whole shape (jstat: shape, scale)', () => {
    expectMoments({ kind: 'gamma', mean: 4, cv: 0.5 }, jStat.gamma.mean(4, 1), jStat.gamma.variance(4, 1));
    expectMoments({ kind: 'erlang', mean: 12, k: 3 }, jStat.gamma.mean(3, 4), jStat.gamma.variance(3, 4));
  });

  it('empirical uses the population moments of the samples', () => {
    expectMoments({ kind: 'empirical', samples: [2, 4, 4, 4, 5, 5, 7, 9] }, 5, 4);
  });

  it('fixed has no spread', () => {
    expectMoments({ kind: 'fixed', value: 9 }, 9, 0);
  });
});

describe('truncated normal moments', () => {
  it.each([
    { mean: 12, sd: 3, min: 10 },
    { mean: 12, sd: 3, min: 12 },
    { mean: 4, sd: 2, min: 0 },
    { mean: 1, sd: 0.1, min: 0.7 },
  ])('mean $mean, sd $sd, cut at $min match numerical integration of the density', ({ mean, sd, min }) => {
    const mass = 1 - jStat.normal.cdf(min, mean, sd);
    const density = (x: number) => jStat.normal.pdf(x, mean, sd) / mass;
    const upper = mean + 12 * sd;
    const m1 = simpson((x) => x * density(x), min, upper);
    const m2 = simpson((x) => (x - m1) ** 2 * density(x), min, upper);
    const d = { kind: 'normal', mean, sd, min } as const;
    expect(distributionMean(d)).toBeCloseTo(m1, 8);
    expect(distributionVariance(d)).toBeCloseTo(m2, 8);
  });

  it('a cut at the mean gives mean + sd·√(2/π) and sd²·(1 − 2/π) (the half-normal; Johnson, Kotz & Balakrishnan 1994, ch. 13, recalled from memory)', () => {
    const d = { kind: 'normal', mean: 12, sd: 3, min: 12 } as const;
    expect(distributionMean(d)).toBeCloseTo(12 + 3 * Math.sqrt(2 / Math.PI), 12);
    expect(distributionVariance(d)).toBeCloseTo(9 * (1 - 2 / Math.PI), 12);
  });

  it('a cut far below the mean leaves the plain normal moments', () => {
    const d = { kind: 'normal', mean: 12, sd: 1, min: 0 } as const;
    expect(distributionMean(d)).toBe(12);
    expect(distributionVariance(d)).toBe(1);
  });
});
