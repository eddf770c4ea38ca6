// The inverse CDFs the samplers are built on, against jstat (a general-purpose statistics library)
// and against their own forward functions: a quantile fed back through the CDF returns the probability.
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import {
  inverseRegularizedLowerGamma,
  normalQuantile,
  normalQuantileFast,
  regularizedLowerGamma,
  regularizedUpperGamma,
  standardNormalCdf,
} from '../../workers/engine/stats/special-functions';

type JStat = {
  normal: { cdf(x: number, m: number, s: number): number; inv(p: number, m: number, s: number): number };
  gamma: { cdf(x: number, shape: number, scale: number): number; inv(p: number, shape: number, scale: number): number };
};
const { jStat } = createRequire(import.meta.url)('jstat') as { jStat: JStat };

const probabilities = [1e-6, 1e-4, 0.001, 0.0242, 0.0243, 0.1, 0.3, 0.5, 0.7, 0.9, 0.97, 0.999, 1 - 1e-6];

describe('standard normal', () => {
  it('the CDF agrees with jstat to 1e-14', () => {
    for (const z of [-6, -3.2, -1, -0.1, 0, 0.4, 1.96, 5])
      expect(standardNormalCdf(z)).toBeCloseTo(jStat.normal.cdf(z, 0, 1), 14);
  });

  it('the CDF keeps its relative precision deep in the lower tail', () => {
    // Φ(−10) = 7.619853024160527e-24 (A&S 1964, Table 26.1 gives Q(10) ≈ 7.6199e-24; digits past the
    // table's recalled from memory).
    expect(standardNormalCdf(-10) / 7.619853024160527e-24).toBeCloseTo(1, 10);
  });

  it('the quantile agrees with jstat to 1e-9 and round-trips through the CDF to 1e-13', () => {
    for (const p of probabilities) {
      const z = normalQuantile(p);
      expect(z).toBeCloseTo(jStat.normal.inv(p, 0, 1), 9);
      const back = p > 0.5 ? 1 - standardNormalCdf(-z) : standardNormalCdf(z);
      expect(Math.abs(back - p) / Math.min(p, 1 - p)).toBeLessThan(1e-13);
    }
  });

  it('the round trip holds out to the smallest uniforms the samplers can see', () => {
    for (const p of [2 ** -33, 1e-20, 1e-100]) expect(standardNormalCdf(normalQuantile(p)) / p).toBeCloseTo(1, 12);
  });

  it("the samplers' fast quantile stays within Acklam's bound of 1.15e-9 relative error", () => {
    for (let k = 1; k < 4000; k++) {
      const p = k < 2000 ? 10 ** (-12 + (k / 2000) * 11.7) : k / 4000;
      const exact = normalQuantile(p);
      expect(Math.abs(normalQuantileFast(p) - exact)).toBeLessThanOrEqual(1.15e-9 * Math.abs(exact) + 1e-15);
    }
  });
});

describe('regularised incomplete gamma and its inverse', () => {
  const shapes = [0.04, 0.39, 1, 3, 6.25, 16, 100, 2_500, 40_000];

  it('P(a, x) agrees with jstat, and P + Q = 1', () => {
    for (const a of shapes) {
      for (const f of [0.2, 0.8, 1, 1.3, 3]) {
        const x = a * f;
        expect(regularizedLowerGamma(a, x)).toBeCloseTo(jStat.gamma.cdf(x, a, 1), 9);
        expect(regularizedLowerGamma(a, x) + regularizedUpperGamma(a, x)).toBeCloseTo(1, 14);
      }
    }
  });

  it('the inverse agrees with jstat to 1e-7 relative and round-trips to 1e-10 of the smaller tail', () => {
    for (const a of shapes) {
      for (const p of probabilities) {
        const x = inverseRegularizedLowerGamma(a, p);
        const reference = jStat.gamma.inv(p, a, 1);
        // jstat stops its own iteration at a relative step of 1e-8.
        expect(Math.abs(x - reference) / reference).toBeLessThan(1e-7);
        const back = p > 0.5 ? 1 - regularizedUpperGamma(a, x) : regularizedLowerGamma(a, x);
        expect(Math.abs(back - p) / Math.min(p, 1 - p)).toBeLessThan(1e-10);
      }
    }
  });

  it('above a million the cube-root approximation stays within 1e-8 of the exact CDF', () => {
    const a = 1.2e6;
    for (const p of [1e-6, 0.01, 0.2, 0.5, 0.8, 0.99]) {
      expect(Math.abs(regularizedLowerGamma(a, inverseRegularizedLowerGamma(a, p)) - p)).toBeLessThan(1e-8);
    }
  });

  it('the ends map to 0 and infinity', () => {
    expect(inverseRegularizedLowerGamma(2, 0)).toBe(0);
    expect(inverseRegularizedLowerGamma(2, 1)).toBe(Infinity);
  });
});
