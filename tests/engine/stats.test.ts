import { describe, expect, it } from 'vitest';
import { StreamingHistogram, TimeWeightedMean, Welford } from '../../workers/engine/stats';
import { createSampler } from '../../workers/engine/random/sampler';
import { createStreamFactory } from '../../workers/engine/random/streams';

describe('Welford running moments', () => {
  it('matches the two-pass mean and sample variance', () => {
    const w = new Welford();
    const xs = [2, 4, 4, 4, 5, 5, 7, 9];
    for (const x of xs) w.push(x);
    expect(w.n).toBe(8);
    expect(w.mean).toBe(5);
    expect(w.variance).toBeCloseTo(32 / 7, 14);
    expect([w.min, w.max]).toEqual([2, 9]);
  });

  it('keeps its accuracy far from zero, where the sum-of-squares shortcut fails', () => {
    // Chan, Golub & LeVeque, "Algorithms for computing the sample variance", Am. Statistician 37(3), 1983:
    // adding a large constant must not change the variance.
    const w = new Welford();
    for (const x of [4, 7, 13, 16]) w.push(1e9 + x);
    expect(w.variance).toBeCloseTo(30, 6);
    let sum = 0;
    let sumSquares = 0;
    for (const x of [4, 7, 13, 16]) {
      sum += 1e9 + x;
      sumSquares += (1e9 + x) ** 2;
    }
    expect(Math.abs((sumSquares - (sum * sum) / 4) / 3 - 30)).toBeGreaterThan(1);
  });

  it('is empty (NaN, not zero) before the first value and after reset; one value has zero variance', () => {
    const w = new Welford();
    expect(w.mean).toBeNaN();
    w.push(3);
    expect(w.variance).toBe(0);
    w.reset();
    expect(w.n).toBe(0);
    expect(w.variance).toBeNaN();
  });
});

describe('time-weighted mean of a piecewise-constant signal', () => {
  it('weights each value by how long it held', () => {
    // Queue length 0 for 10 s, 3 for 5 s, 1 for 5 s: (0·10 + 3·5 + 1·5) / 20 = 1.
    const q = new TimeWeightedMean(0, 0);
    q.update(10, 3);
    q.update(15, 1);
    expect(q.mean(20)).toBe(1);
    expect(q.max).toBe(3);
    expect(q.current).toBe(1);
  });

  it('reset at the end of the warm-up forgets the past but keeps the present value', () => {
    const q = new TimeWeightedMean(0, 8);
    q.update(100, 2);
    q.reset(150);
    expect(q.max).toBe(2);
    q.update(160, 4);
    // From 150: 2 for 10 s, 4 for 30 s = 140 / 40.
    expect(q.mean(190)).toBe(3.5);
  });

  it('an empty window has no mean', () => {
    expect(new TimeWeightedMean(5, 1).mean(5)).toBeNaN();
  });
});

describe('streaming histogram', () => {
  const draws = (n: number) => {
    const sample = createSampler({ kind: 'lognormal', mean: 40, cv: 0.5 }, createStreamFactory('hist', 0)('lead'));
    return Float64Array.from({ length: n }, sample);
  };

  it('gives p50 and p95 within one bin width of the exact order statistics, and the exact mean', () => {
    const values = draws(100_000);
    const h = new StreamingHistogram(0.01);
    for (const v of values) h.add(v);
    const sorted = values.slice().sort();
    const { binWidth } = h.snapshot();
    expect(binWidth).toBeLessThanOrEqual((2 * h.max) / 256);
    expect(Math.abs(h.p50 - sorted[49_999])).toBeLessThanOrEqual(binWidth);
    expect(Math.abs(h.p95 - sorted[94_999])).toBeLessThanOrEqual(binWidth);
    expect(h.mean).toBeCloseTo(values.reduce((a, b) => a + b) / values.length, 9);
    expect(h.snapshot().counts.reduce((a, b) => a + b)).toBe(100_000);
  });

  it('keeps the same number of bins however many observations arrive', () => {
    const h = new StreamingHistogram(0.001, 64);
    for (let i = 0; i < 1_000_000; i++) h.add(i % 5000);
    expect(h.snapshot().counts.length).toBe(64);
    expect(h.n).toBe(1_000_000);
    expect(h.max).toBe(4999);
  });

  it('reset returns to the finest bins and no observations', () => {
    const h = new StreamingHistogram(0.5, 8);
    h.add(100);
    h.reset();
    expect(h.snapshot().binWidth).toBe(0.5);
    expect(h.p50).toBeNaN();
    h.add(1.2);
    expect(h.p50).toBe(1.2);
  });

  it('refuses a non-finite observation instead of growing forever', () => {
    expect(() => new StreamingHistogram(1).add(Infinity)).toThrow(
      'StreamingHistogram: observation must be finite, got Infinity',
    );
    expect(() => new StreamingHistogram(0)).toThrow(/initialBinWidth must be a positive finite number/);
    expect(() => new StreamingHistogram(1, 7)).toThrow(/binCount must be an even whole number/);
  });
});
