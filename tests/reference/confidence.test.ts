// Student t quantiles and 95 % intervals against printed tables, closed forms and jstat.
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { studentT95, tQuantile } from '../../workers/engine/stats/student-t';
import { lnGamma, regularizedBeta } from '../../workers/engine/stats/special-functions';

type JStatT = {
  studentt: { inv: (p: number, df: number) => number; cdf: (t: number, df: number) => number };
  mean: (x: number[]) => number;
  stdev: (x: number[], sample: boolean) => number;
};
const { jStat } = createRequire(import.meta.url)('jstat') as { jStat: JStatT };

describe('t quantiles', () => {
  // Two-sided 95 % (p = 0.975) and 99 % (p = 0.995) critical values to three decimals, as printed in
  // Fisher & Yates, "Statistical Tables for Biological, Agricultural and Medical Research", 1938,
  // Table III, and reproduced in most statistics textbooks (values recalled from memory).
  it.each([
    [1, 0.975, 12.706],
    [2, 0.975, 4.303],
    [4, 0.975, 2.776],
    [9, 0.975, 2.262],
    [10, 0.975, 2.228],
    [19, 0.975, 2.093],
    [29, 0.975, 2.045],
    [9, 0.995, 3.25],
    [30, 0.995, 2.75],
  ])('t(%d df, p = %d) = %d to the printed three decimals', (df, p, printed) => {
    expect(tQuantile(p, df)).toBeCloseTo(printed, 3);
  });

  it('df = 1 and df = 2 match their closed forms (Cauchy tan(π(p − ½)); (2p − 1)/√(2p(1 − p)))', () => {
    for (const p of [0.6, 0.9, 0.975, 0.999]) {
      expect(tQuantile(p, 1)).toBeCloseTo(Math.tan(Math.PI * (p - 0.5)), 12);
      expect(tQuantile(p, 2)).toBeCloseTo((2 * p - 1) / Math.sqrt(2 * p * (1 - p)), 12);
    }
  });

  it('large df approaches the standard normal 97.5 % point 1.959964 (recalled from memory)', () => {
    expect(tQuantile(0.975, 1e7)).toBeCloseTo(1.959964, 6);
  });

  it('agrees with jstat studentt.inv over a range of df and p (jstat inverts to about 1e-8)', () => {
    for (const df of [3, 4.5, 5, 7, 12, 30, 60, 120, 500, 5000]) {
      for (const p of [0.55, 0.8, 0.9, 0.95, 0.975, 0.99, 0.995, 0.9995]) {
        const ours = tQuantile(p, df);
        expect(Math.abs(ours - jStat.studentt.inv(p, df))).toBeLessThan(1e-6 * Math.abs(ours));
        expect(tQuantile(1 - p, df)).toBe(-ours);
        // Round trip through jstat's CDF, which is computed independently of the inverse.
        expect(jStat.studentt.cdf(ours, df)).toBeCloseTo(p, 7);
      }
    }
  });

  it('refuses p outside (0, 1) and non-positive df with a clear message', () => {
    expect(() => tQuantile(1, 5)).toThrow('tQuantile: p must lie strictly between 0 and 1, got 1');
    expect(() => tQuantile(0.9, 0)).toThrow('tQuantile: df must be a positive finite number, got 0');
  });

  it('the incomplete beta function meets its closed forms I_x(a, 1) = x^a and I_x(1, b) = 1 − (1 − x)^b (they follow from the definition; Abramowitz & Stegun 1964, §26.5)', () => {
    for (const x of [0.01, 0.2, 0.5, 0.8, 0.99]) {
      for (const shape of [0.5, 2, 7.5, 40]) {
        expect(regularizedBeta(x, shape, 1)).toBeCloseTo(x ** shape, 13);
        expect(regularizedBeta(x, 1, shape)).toBeCloseTo(1 - (1 - x) ** shape, 13);
      }
    }
  });

  it('log-gamma reproduces factorials and Γ(½) = √π', () => {
    expect(lnGamma(0.5)).toBeCloseTo(0.5 * Math.log(Math.PI), 13);
    let factorial = 1;
    for (let n = 1; n <= 20; n++) {
      expect(Math.abs(lnGamma(n + 1) - Math.log((factorial *= n)))).toBeLessThan(
        1e-12 * Math.max(1, Math.log(factorial)),
      );
    }
  });
});

describe('95 % confidence interval of a mean', () => {
  it('ten replications: mean ± t(0.975, 9)·s/√n with t = 2.262 from the printed table', () => {
    // Throughput per hour from ten invented replications.
    const samples = [1712, 1698, 1731, 1705, 1720, 1689, 1726, 1710, 1701, 1718];
    const ci = studentT95(samples);
    const s = jStat.stdev(samples, true);
    expect(ci.n).toBe(10);
    expect(ci.mean).toBeCloseTo(jStat.mean(samples), 10);
    expect(ci.halfWidth).toBeCloseTo((2.262 * s) / Math.sqrt(10), 2);
    expect(ci.halfWidth).toBeCloseTo((jStat.studentt.inv(0.975, 9) * s) / Math.sqrt(10), 6);
    expect(ci.ciLow).toBeCloseTo(ci.mean - ci.halfWidth, 10);
    expect(ci.ciHigh).toBeCloseTo(ci.mean + ci.halfWidth, 10);
  });

  it('one replication gives a zero-width interval, flagged by n = 1', () => {
    expect(studentT95([1700])).toEqual({ mean: 1700, ciLow: 1700, ciHigh: 1700, halfWidth: 0, n: 1 });
  });

  it('no replication at all is refused with a message', () => {
    expect(() => studentT95([])).toThrow('studentT95: needs at least one sample');
  });

  it('identical replications give a zero-width interval', () => {
    expect(studentT95([5, 5, 5]).halfWidth).toBe(0);
  });
});
