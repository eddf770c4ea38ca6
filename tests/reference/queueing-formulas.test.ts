// The queueing formulas the engine is checked against, checked first themselves against independent
// closed forms, so a mistake in a reference cannot pass for a mistake in the engine.
import { describe, expect, it } from 'vitest';
import { finiteSourceThroughput, mvaThroughput, trapezoidMoveSeconds, twoMachineLine } from './support/queueing';

describe('exact Mean Value Analysis (Reiser & Lavenberg, J. ACM 27(2), 1980)', () => {
  it('one station and a delay equals the finite-source queue (Kleinrock 1975, §3.8, recalled from memory)', () => {
    const x = mvaThroughput([2], 5, 10);
    for (let n = 1; n <= 10; n++) expect(x[n - 1]).toBeCloseTo(finiteSourceThroughput(2, 5, n), 12);
  });

  it('one customer sees no queue: X(1) = 1 / (Z + Σ s_k)', () => {
    expect(mvaThroughput([1, 2, 3], 4, 1)[0]).toBeCloseTo(1 / 10, 14);
  });

  it('two equal stations without delay: X(n) = n / (s (n + 1)) (balanced network; Lazowska et al., "Quantitative System Performance", 1984, §6.3, recalled from memory)', () => {
    const x = mvaThroughput([3, 3], 0, 8);
    for (let n = 1; n <= 8; n++) expect(x[n - 1]).toBeCloseTo(n / (3 * (n + 1)), 12);
  });

  it('a two-server station and a delay equals the finite-source queue with two servers (machine repair with two repairers; Gross & Harris, "Fundamentals of Queueing Theory", 3rd ed. 1998, §2.8, recalled from memory)', () => {
    // p_j ∝ N!/(N − j)! · (s/z)^j / β(j), β(j) = j! for j ≤ c and c! c^(j − c) beyond; X = Σ p_j min(j, c) / s.
    const [s, z, c] = [5, 6, 2];
    const x = mvaThroughput([s], z, 8, [c]);
    for (let n = 1; n <= 8; n++) {
      let term = 1;
      const weights = [1];
      for (let j = 1; j <= n; j++) {
        term *= ((n - j + 1) * (s / z)) / Math.min(j, c);
        weights.push(term);
      }
      const total = weights.reduce((a, b) => a + b, 0);
      const closedForm = weights.reduce((sum, w, j) => sum + (w / total) * (Math.min(j, c) / s), 0);
      expect(x[n - 1]).toBeCloseTo(closedForm, 12);
    }
  });

  it('as many servers as customers: no one queues, X(n) = n / (Z + Σ s_k)', () => {
    const x = mvaThroughput([2, 3], 4, 5, [5, 5]);
    for (let n = 1; n <= 5; n++) expect(x[n - 1]).toBeCloseTo(n / 9, 12);
  });

  it('throughput rises with the population towards the bottleneck rate 1 / max s_k', () => {
    const x = mvaThroughput([2, 4, 3], 6, 60);
    for (let n = 1; n < x.length; n++) expect(x[n]).toBeGreaterThan(x[n - 1]);
    expect(x[59]).toBeLessThan(1 / 4);
    expect(x[59]).toBeGreaterThan(0.99 / 4);
  });
});

describe('two exponential machines with a buffer between them (birth–death chain)', () => {
  it('with no place between and equal rates, the three states are equally likely: TH = 2μ/3', () => {
    const line = twoMachineLine(1, 1, 0);
    for (const p of line.probabilities) expect(p).toBeCloseTo(1 / 3, 14);
    expect(line.throughput).toBeCloseTo(2 / 3, 14);
  });

  it('the flow balances: μ1 (1 − p_blocked) = μ2 (1 − p_starved)', () => {
    for (const [mu1, mu2, b] of [
      [1, 0.8, 0],
      [0.7, 1.3, 2],
      [2, 1.5, 5],
    ]) {
      const line = twoMachineLine(mu1, mu2, b);
      expect(mu1 * (1 - line.blocked)).toBeCloseTo(mu2 * (1 - line.starved), 12);
      expect(line.probabilities.reduce((a, c) => a + c, 0)).toBeCloseTo(1, 14);
    }
  });

  it('a very large buffer approaches the slower machine', () => {
    expect(twoMachineLine(1, 0.8, 400).throughput).toBeCloseTo(0.8, 10);
  });
});

describe('trapezoidal move time', () => {
  it('matches the two textbook cases at and around v²/a', () => {
    expect(trapezoidMoveSeconds(1000, 2500, 20_000)).toBeCloseTo(0.525, 12);
    expect(trapezoidMoveSeconds(210, 2500, 20_000)).toBeCloseTo(2 * Math.sqrt(210 / 20_000), 12);
    expect(trapezoidMoveSeconds(312.5, 2500, 20_000)).toBeCloseTo(0.25, 12);
  });
});
