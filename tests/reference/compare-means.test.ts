// Intervals on the difference of two scenarios' means against a worked example computed independently:
// by hand with a printed t table, and with jstat 1.9.6's Student t quantiles. The method follows Law,
// "Simulation Modeling and Analysis", 5th ed. 2015, §10.2.1 (paired t) and §10.2.2 (Welch).
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { pairedDifference, welchDifference } from '../../workers/analysis/compare-means';

type JStatT = {
  studentt: { inv: (p: number, df: number) => number };
  mean: (x: number[]) => number;
  variance: (x: number[], sample: boolean) => number;
};
const { jStat } = createRequire(import.meta.url)('jstat') as { jStat: JStatT };

// Throughput per hour of ten replications of two layouts run with the same seeds (invented figures,
// chosen so the layouts share most of their replication-to-replication noise).
const stacked = [402.1, 395.4, 410.8, 388.9, 405.2, 399.7, 392.3, 407.6, 401.0, 396.8];
const sideBySide = [406.0, 398.2, 415.9, 391.5, 409.9, 402.4, 397.1, 411.3, 403.8, 401.2];

describe('paired-t interval on the difference (Law 2015, §10.2.1)', () => {
  it('matches the hand-computed example: differences 1, 2, 3, 4, 5', () => {
    // Mean 3, sample sd √2.5, standard error √2.5/√5 = 0.70711; t(4 df, 0.975) = 2.776 from the
    // printed table (Fisher & Yates 1938, Table III; recalled from memory) gives a half-width 1.9632.
    const d = pairedDifference([10, 10, 10, 10, 10], [11, 12, 13, 14, 15]);
    expect(d.method).toBe('paired');
    expect(d.difference).toBeCloseTo(3, 12);
    expect(d.degreesOfFreedom).toBe(4);
    expect(d.halfWidth).toBeCloseTo(2.776 * Math.sqrt(2.5 / 5), 3);
    expect(d.significant).toBe(true);
  });

  it('matches the same interval computed with jstat from the differences', () => {
    const differences = stacked.map((x, i) => sideBySide[i] - x);
    const n = differences.length;
    const halfWidth = jStat.studentt.inv(0.975, n - 1) * Math.sqrt(jStat.variance(differences, true) / n);
    const d = pairedDifference(stacked, sideBySide);
    expect(d.difference).toBeCloseTo(jStat.mean(differences), 10);
    expect(d.ciLow).toBeCloseTo(jStat.mean(differences) - halfWidth, 8);
    expect(d.ciHigh).toBeCloseTo(jStat.mean(differences) + halfWidth, 8);
    expect(d.significant).toBe(true);
  });

  it('pairing finds a difference that independent samples of the same numbers cannot', () => {
    // The shared noise cancels in the differences; Welch sees only two wide, overlapping intervals.
    expect(pairedDifference(stacked, sideBySide).significant).toBe(true);
    expect(welchDifference(stacked, sideBySide).significant).toBe(false);
  });

  it('is not significant when the interval holds zero', () => {
    const d = pairedDifference([1, 2, 3, 4], [2, 1, 4, 3]);
    expect(d.difference).toBe(0);
    expect(d.ciLow).toBeLessThan(0);
    expect(d.ciHigh).toBeGreaterThan(0);
    expect(d.significant).toBe(false);
  });

  it('says why there is no interval with one replication, and refuses unequal lengths', () => {
    const d = pairedDifference([5], [7]);
    expect(d.difference).toBe(2);
    expect(d.significant).toBe(false);
    expect(d.unavailable).toMatch(/two replications/);
    expect(() => pairedDifference([1, 2], [1])).toThrow(/one value per replication/);
  });

  it('a difference without any spread is exact', () => {
    const d = pairedDifference([100, 110, 90], [104, 114, 94]);
    expect(d.halfWidth).toBe(0);
    expect(d.significant).toBe(true);
  });
});

describe('Welch interval for runs with different seeds (Law 2015, §10.2.2)', () => {
  it('matches the Welch–Satterthwaite interval computed with jstat', () => {
    const a = [12.1, 14.3, 13.8, 12.9, 15.2];
    const b = [16.4, 15.1, 17.9, 16.8, 15.5, 17.2, 16.1];
    const va = jStat.variance(a, true) / a.length;
    const vb = jStat.variance(b, true) / b.length;
    const df = (va + vb) ** 2 / (va ** 2 / (a.length - 1) + vb ** 2 / (b.length - 1));
    const halfWidth = jStat.studentt.inv(0.975, df) * Math.sqrt(va + vb);
    const d = welchDifference(a, b);
    expect(d.method).toBe('welch');
    expect(d.degreesOfFreedom).toBeCloseTo(df, 10);
    expect(d.difference).toBeCloseTo(jStat.mean(b) - jStat.mean(a), 10);
    // jstat inverts the t distribution numerically to about 1e-8 at a fractional df; six decimals.
    expect(d.halfWidth).toBeCloseTo(halfWidth, 6);
    expect(d.significant).toBe(true);
  });
});
