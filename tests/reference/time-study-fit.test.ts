// The time-study analysis against published closed forms, hand-computed examples and jstat's reference
// functions: maximum-likelihood fits, the Kolmogorov–Smirnov statistic and p-value, and the histogram rule.
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import type { FittedCandidate } from '../../shared/api/time-studies';
import {
  analyseTimeStudy,
  fitGamma,
  fitLognormal,
  fitNormal,
  histogram,
  kolmogorovSurvival,
  ksPValue,
  ksStatistic,
  summarise,
} from '../../workers/analysis';
import {
  digamma,
  lnGamma,
  regularizedLowerGamma,
  standardNormalCdf,
  trigamma,
} from '../../workers/engine/stats/special-functions';
import { createSampler } from '../../workers/engine/random/sampler';
import { createStreamFactory } from '../../workers/engine/random/streams';

type Fn = (x: number, ...params: number[]) => number;
interface JStat {
  gammaln: (x: number) => number;
  normal: { cdf: Fn; pdf: Fn };
  lognormal: { cdf: Fn; pdf: Fn };
  gamma: { cdf: Fn; pdf: Fn };
}
const { jStat } = createRequire(import.meta.url)('jstat') as { jStat: JStat };

function fitted(samples: number[], kind: FittedCandidate['kind']): FittedCandidate {
  const found = analyseTimeStudy(samples).candidates.find((c) => c.kind === kind);
  if (found?.status !== 'fitted') throw new Error(`${kind} was not fitted`);
  return found;
}

function seededGamma(mean: number, cv: number, n: number, key: string): number[] {
  const draw = createSampler({ kind: 'gamma', mean, cv }, createStreamFactory('time-study-fit', 1)(key));
  return Array.from({ length: n }, draw);
}

describe('special functions against jstat 1.9.6 and Abramowitz & Stegun (1964)', () => {
  it('ln Γ matches jStat.gammaln to its accuracy, Γ(1/2) = √π (A&S 6.1.8) and ln 149! exactly', () => {
    for (const x of [0.1, 0.5, 1, 2.5, 7.3, 19.9, 150]) expect(lnGamma(x)).toBeCloseTo(jStat.gammaln(x), 9);
    expect(lnGamma(0.5)).toBeCloseTo(0.5 * Math.log(Math.PI), 14);
    let lnFactorial = 0;
    for (let k = 2; k < 150; k += 1) lnFactorial += Math.log(k);
    expect(lnGamma(150)).toBeCloseTo(lnFactorial, 11);
  });

  it('ψ(1) = −γ (A&S 6.3.2) and ψ′(1) = π²/6 (A&S 6.4.2); ψ(x + 1) = ψ(x) + 1/x', () => {
    expect(digamma(1)).toBeCloseTo(-0.5772156649015329, 13);
    expect(trigamma(1)).toBeCloseTo((Math.PI * Math.PI) / 6, 13);
    for (const x of [0.3, 2.7, 31]) expect(digamma(x + 1) - digamma(x)).toBeCloseTo(1 / x, 12);
  });

  it('the regularised incomplete gamma and Φ match jStat.gamma.cdf and jStat.normal.cdf', () => {
    // jstat's incomplete gamma is good to about 1e-10, which bounds how closely it can check ours.
    for (const [a, x] of [
      [0.5, 0.1],
      [2.5, 3],
      [9, 4],
      [9, 20],
      [40, 38],
    ])
      expect(regularizedLowerGamma(a, x)).toBeCloseTo(jStat.gamma.cdf(x, a, 1), 9);
    for (const z of [-6, -1.96, -0.3, 0, 0.7, 2.33, 5])
      expect(standardNormalCdf(z)).toBeCloseTo(jStat.normal.cdf(z, 0, 1), 12);
  });

  it('the regularised incomplete gamma matches 30-digit values of mpmath 1.3.0, gammainc(a, 0, x, regularized=True)', () => {
    expect(regularizedLowerGamma(9, 4)).toBeCloseTo(0.0213634344879841634, 14);
    expect(regularizedLowerGamma(2.5, 3)).toBeCloseTo(0.693781081586721599, 14);
    // 13 digits here: the Lanczos log-gamma's relative error near 1e-15 of ln Γ(40) ≈ 109.6 shows as ~8e-15.
    expect(regularizedLowerGamma(40, 38)).toBeCloseTo(0.394080632118893451, 13);
    expect(regularizedLowerGamma(9, 20)).toBeCloseTo(0.997912740950864981, 14);
  });
});

describe('maximum-likelihood fits', () => {
  it('normal: the sample mean and the n-denominator sd (worked example 2,4,4,4,5,5,7,9: mean 5, sd 2; recalled from memory)', () => {
    const estimate = fitNormal([2, 4, 4, 4, 5, 5, 7, 9]);
    expect(estimate.ok && estimate.parameters).toEqual({ mean: 5, sd: 2 });
  });

  it('the summary sd uses n − 1 while the normal fit uses n', () => {
    const samples = [2, 4, 4, 4, 5, 5, 7, 9];
    expect(summarise(samples).sd).toBeCloseTo(Math.sqrt(32 / 7), 14);
    expect(fitted(samples, 'normal').parameters).toMatchObject({ mean: 5, sd: 2 });
  });

  it('lognormal: μ̂ and σ̂ are the mean and n-sd of the logs; mean exp(μ + σ²/2), cv √(e^σ² − 1) (Johnson, Kotz & Balakrishnan 1994, ch. 14)', () => {
    const estimate = fitLognormal([Math.E, Math.E ** 2, Math.E ** 3]);
    if (!estimate.ok) throw new Error(estimate.reason);
    expect(estimate.parameters.mu).toBeCloseTo(2, 14);
    expect(estimate.parameters.sigma).toBeCloseTo(Math.sqrt(2 / 3), 14);
    expect(estimate.parameters.mean).toBeCloseTo(Math.exp(2 + 1 / 3), 12);
    expect(estimate.parameters.cv).toBeCloseTo(Math.sqrt(Math.exp(2 / 3) - 1), 14);
  });

  it('gamma: the fit solves the likelihood equation ln k − ψ(k) = ln x̄ − mean(ln x) (Minka, "Estimating a Gamma distribution", 2002, eq. 2)', () => {
    const samples = [7.9, 9.4, 10.2, 8.1, 12.6, 9.9, 11.3, 8.8, 14.1, 9.0];
    const estimate = fitGamma(samples);
    if (!estimate.ok) throw new Error(estimate.reason);
    const { shape, scale, mean } = estimate.parameters;
    const s = Math.log(mean) - samples.reduce((a, x) => a + Math.log(x), 0) / samples.length;
    expect(Math.log(shape) - digamma(shape)).toBeCloseTo(s, 12);
    expect(shape * scale).toBeCloseTo(samples.reduce((a, x) => a + x, 0) / samples.length, 12);
  });

  it('gamma: the fit maximises the log-likelihood computed with jStat.gamma.pdf', () => {
    const samples = seededGamma(9, 0.35, 400, 'likelihood');
    const estimate = fitGamma(samples);
    if (!estimate.ok) throw new Error(estimate.reason);
    const { shape, scale } = estimate.parameters;
    const logLikelihood = (k: number, theta: number) =>
      samples.reduce((sum, x) => sum + Math.log(jStat.gamma.pdf(x, k, theta)), 0);
    const best = logLikelihood(shape, scale);
    for (const [dk, dt] of [
      [1.01, 1],
      [0.99, 1],
      [1, 1.01],
      [1, 0.99],
      [1.01, 0.99],
      [0.99, 1.01],
    ]) {
      expect(logLikelihood(shape * dk, scale * dt)).toBeLessThan(best);
    }
  });

  it('samples drawn from a known gamma (mean 12 s, cv 0.3, i.e. shape 11.1) recover it within sampling error', () => {
    const samples = seededGamma(12, 0.3, 20_000, 'recovery');
    const estimate = fitGamma(samples);
    if (!estimate.ok) throw new Error(estimate.reason);
    // Standard errors at n = 20,000: mean ≈ 12 · 0.3 / √n ≈ 0.025; shape ≈ k √(2/n) ≈ 0.11 (asymptotic; recalled from memory).
    expect(estimate.parameters.mean).toBeGreaterThan(12 - 4 * 0.025);
    expect(estimate.parameters.mean).toBeLessThan(12 + 4 * 0.025);
    expect(Math.abs(estimate.parameters.shape - 1 / 0.09)).toBeLessThan(4 * 0.11);
    expect(estimate.parameters.cv).toBeCloseTo(0.3, 2);
  });

  it('gamma fits near-exponential and near-constant samples: small and large shapes converge', () => {
    for (const [cv, key] of [
      [1.8, 'wide'],
      [0.02, 'narrow'],
    ] as const) {
      const estimate = fitGamma(seededGamma(5, cv, 5_000, key));
      if (!estimate.ok) throw new Error(estimate.reason);
      expect(estimate.parameters.cv / cv).toBeGreaterThan(0.9);
      expect(estimate.parameters.cv / cv).toBeLessThan(1.1);
    }
  });

  it('refuses lognormal and gamma for zero or negative samples, and every family for a constant study, with the reason', () => {
    const zeros = analyseTimeStudy([0, 4, 5, 6]);
    expect(zeros.candidates.map((c) => [c.kind, c.status])).toEqual([
      ['normal', 'fitted'],
      ['lognormal', 'refused'],
      ['gamma', 'refused'],
    ]);
    const refused = zeros.candidates[1];
    expect(refused.status === 'refused' && refused.reason).toMatch(
      /only positive values, but 1 of 4 samples are zero or below/,
    );
    const constant = analyseTimeStudy([9, 9, 9]);
    expect(constant.candidates.every((c) => c.status === 'refused' && /fixed time/.test(c.reason))).toBe(true);
  });
});

describe('Kolmogorov–Smirnov goodness of fit', () => {
  it('D by hand: samples 0.5, 1, 4 against uniform(0, 5) give D = 2/3 − 1/5 = 7/15', () => {
    expect(ksStatistic([0.5, 1, 4], (x) => x / 5)).toBeCloseTo(7 / 15, 15);
  });

  it('D of each fitted candidate equals a brute-force D with jstat’s CDFs', () => {
    const samples = seededGamma(10, 0.4, 300, 'ks-jstat');
    const sorted = [...samples].sort((a, b) => a - b);
    const bruteForce = (cdf: (x: number) => number) =>
      Math.max(...sorted.map((x, i) => Math.max((i + 1) / sorted.length - cdf(x), cdf(x) - i / sorted.length)));
    const normal = fitted(samples, 'normal');
    const lognormal = fitted(samples, 'lognormal');
    const gamma = fitted(samples, 'gamma');
    if (normal.kind !== 'normal' || lognormal.kind !== 'lognormal' || gamma.kind !== 'gamma')
      throw new Error('unexpected kinds');
    expect(normal.goodness.d).toBeCloseTo(
      bruteForce((x) => jStat.normal.cdf(x, normal.parameters.mean, normal.parameters.sd)),
      10,
    );
    expect(lognormal.goodness.d).toBeCloseTo(
      bruteForce((x) => jStat.lognormal.cdf(x, lognormal.parameters.mu, lognormal.parameters.sigma)),
      10,
    );
    expect(gamma.goodness.d).toBeCloseTo(
      bruteForce((x) => jStat.gamma.cdf(x, gamma.parameters.shape, gamma.parameters.scale)),
      10,
    );
  });

  it('the Kolmogorov survival function gives the tabulated critical values 1.224, 1.358 and 1.628 for 10, 5 and 1 % (Smirnov 1948 table; common trade practice)', () => {
    expect(kolmogorovSurvival(1.224)).toBeCloseTo(0.1, 3);
    expect(kolmogorovSurvival(1.358)).toBeCloseTo(0.05, 3);
    expect(kolmogorovSurvival(1.628)).toBeCloseTo(0.01, 3);
  });

  it('its two series agree where they meet (λ = 1.18), and it falls from 1 to 0', () => {
    const alternating = (l: number) =>
      2 *
      Array.from({ length: 50 }, (_, j) => (j % 2 === 0 ? 1 : -1) * Math.exp(-2 * (j + 1) ** 2 * l * l)).reduce(
        (a, b) => a + b,
        0,
      );
    for (const l of [0.9, 1.17, 1.19]) expect(kolmogorovSurvival(l)).toBeCloseTo(alternating(l), 12);
    expect(kolmogorovSurvival(0.2)).toBeCloseTo(1, 10);
    expect(kolmogorovSurvival(3)).toBeLessThan(1e-7);
  });

  it('the p-value uses Stephens’ factor √n + 0.12 + 0.11/√n (Stephens 1970; Numerical Recipes 3rd ed. §14.3.3)', () => {
    expect(ksPValue(0.1, 100)).toBeCloseTo(kolmogorovSurvival((10 + 0.12 + 0.011) * 0.1), 15);
  });

  it('ranks the true family first: gamma samples put gamma ahead of normal', () => {
    const ranked = analyseTimeStudy(seededGamma(6, 0.8, 3_000, 'ranking')).candidates;
    expect(ranked[0].kind).toBe('gamma');
    const ds = ranked.map((c) => (c.status === 'fitted' ? c.goodness.d : Number.NaN));
    expect(ds).toEqual([...ds].sort((a, b) => a - b));
  });
});

describe('summary and histogram', () => {
  it('quantiles interpolate between order statistics (Hyndman & Fan 1996, definition 7)', () => {
    const { quantiles } = summarise([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11]);
    expect(quantiles).toEqual({ p05: 1.5, p25: 3.5, p50: 6, p75: 8.5, p95: 10.5 });
  });

  it('bin width follows Freedman & Diaconis (1981): h = 2 · IQR · n^(−1/3), rounded up to whole bins over the range', () => {
    const sorted = seededGamma(20, 0.25, 1_000, 'bins').sort((a, b) => a - b);
    const result = histogram(sorted);
    const iqr = summarise(sorted).quantiles.p75 - summarise(sorted).quantiles.p25;
    const bins = Math.ceil((sorted[sorted.length - 1] - sorted[0]) / (2 * iqr * 1_000 ** (-1 / 3)));
    expect(result.rule).toBe('freedman-diaconis');
    expect(result.bins).toHaveLength(bins);
    expect(result.bins.reduce((a, b) => a + b.count, 0)).toBe(1_000);
  });

  it('falls back to Sturges (1926), ⌈log₂ n⌉ + 1 bins, when over half the samples are equal', () => {
    const result = histogram([5, 5, 5, 5, 5, 5, 5, 6, 7]);
    expect(result.rule).toBe('sturges');
    expect(result.bins).toHaveLength(5);
    expect(result.bins.at(-1)?.count).toBe(1);
  });
});
