import { describe, expect, it } from 'vitest';
import type { Distribution } from '../../shared/scenario/distribution';
import { createSampler } from '../../workers/engine/random/sampler';
import { createStreamFactory, streamSeed } from '../../workers/engine/random/streams';

const take = (next: () => number, count: number) => Array.from({ length: count }, next);

describe('random streams', () => {
  it('the same seed, replication and key give the same sequence', () => {
    const a = take(createStreamFactory('plant-7', 3)('station:press:cycle'), 1000);
    const b = take(createStreamFactory('plant-7', 3).stream('station:press:cycle'), 1000);
    expect(a).toEqual(b);
  });

  it('another seed, replication or key gives a different sequence', () => {
    const base = take(createStreamFactory(42, 0)('station:press:cycle'), 100);
    expect(take(createStreamFactory(43, 0)('station:press:cycle'), 100)).not.toEqual(base);
    expect(take(createStreamFactory(42, 1)('station:press:cycle'), 100)).not.toEqual(base);
    expect(take(createStreamFactory(42, 0)('station:press:failure'), 100)).not.toEqual(base);
  });

  it('a numeric seed and its decimal string are the same seed', () => {
    expect(take(createStreamFactory(42, 0)('k'), 10)).toEqual(take(createStreamFactory('42', 0)('k'), 10));
  });

  it('seed parts cannot run into each other', () => {
    expect(streamSeed('1', 23, 'k')).not.toBe(streamSeed('12', 3, 'k'));
    expect(streamSeed('a', 0, 'b|c')).not.toBe(streamSeed('a|b', 0, 'c'));
  });

  it("drawing more from one station's stream leaves another station's draws unchanged", () => {
    const alone = take(createStreamFactory(7, 0)('station:screw:cycle'), 500);
    const factory = createStreamFactory(7, 0);
    const busy = factory('station:press:cycle');
    const screw = factory('station:screw:cycle');
    const interleaved: number[] = [];
    for (let i = 0; i < 500; i++) {
      take(busy, 1 + (i % 5));
      interleaved.push(screw());
    }
    expect(interleaved).toEqual(alone);
  });

  it('streams of different keys are uncorrelated', () => {
    const n = 100_000;
    const factory = createStreamFactory('corr', 0);
    const x = factory('station:1:cycle');
    const y = factory('station:2:cycle');
    let sx = 0,
      sy = 0,
      sxx = 0,
      syy = 0,
      sxy = 0;
    for (let i = 0; i < n; i++) {
      const a = x();
      const b = y();
      sx += a;
      sy += b;
      sxx += a * a;
      syy += b * b;
      sxy += a * b;
    }
    const r = (n * sxy - sx * sy) / Math.sqrt((n * sxx - sx * sx) * (n * syy - sy * sy));
    // Under independence r has standard error 1/√n (R. A. Fisher, "Statistical Methods for Research
    // Workers", 1925, ch. VI; recalled from memory): five standard errors is a generous bound.
    expect(Math.abs(r)).toBeLessThan(5 / Math.sqrt(n));
  });

  it('draws lie in [0, 1)', () => {
    const draws = take(createStreamFactory(1, 0)('range'), 100_000);
    expect(draws.every((u) => u >= 0 && u < 1)).toBe(true);
  });
});

describe('samplers', () => {
  it('a sampler fed the same stream repeats its draws (common random numbers)', () => {
    const d = { kind: 'gamma', mean: 9, cv: 0.4 } as const;
    const first = take(createSampler(d, createStreamFactory(5, 2)('s')), 200);
    const second = take(createSampler(d, createStreamFactory(5, 2)('s')), 200);
    expect(first).toEqual(second);
  });

  it('a truncated normal maps u = 0 to its cut and never draws below it, however low the cut sits', () => {
    for (const min of [11, 0, 11.999]) {
      const d = { kind: 'normal', mean: 12, sd: 1, min } as const;
      expect(createSampler(d, () => 0)()).toBeCloseTo(min, 9);
      expect(createSampler(d, () => 1 - 2 ** -32)()).toBeGreaterThan(12);
    }
  });

  const everyKind: Distribution[] = [
    { kind: 'fixed', value: 4 },
    { kind: 'uniform', min: 2, max: 6 },
    { kind: 'triangular', min: 8, mode: 9, max: 15 },
    { kind: 'normal', mean: 12, sd: 3, min: 10 },
    { kind: 'lognormal', mean: 9, cv: 0.3 },
    { kind: 'exponential', mean: 600 },
    { kind: 'erlang', mean: 12, k: 3 },
    { kind: 'gamma', mean: 4, cv: 0.25 },
    { kind: 'gamma', mean: 4, cv: 4 },
    { kind: 'empirical', samples: [7.9, 8.4, 9.1] },
  ];

  it.each(everyKind)('$kind takes exactly one uniform per draw, whatever the uniforms are', (d) => {
    const stream = createStreamFactory('one-each', 0)('k');
    let calls = 0;
    const counted = () => {
      calls++;
      return stream();
    };
    const sample = createSampler(d, counted);
    for (let i = 1; i <= 20_000; i++) {
      sample();
      expect(calls).toBe(i);
    }
  });

  it.each(everyKind.filter((d) => d.kind !== 'fixed' && d.kind !== 'empirical'))(
    '$kind draws grow with the uniform (inverse transform)',
    (d) => {
      let u = 0;
      const sample = createSampler(d, () => u);
      let previous = -Infinity;
      for (let k = 0; k <= 1000; k++) {
        u = Math.min(k / 1000, 1 - 2 ** -32);
        const x = sample();
        expect(Number.isFinite(x)).toBe(true);
        expect(x).toBeGreaterThanOrEqual(previous);
        previous = x;
      }
    },
  );

  it('the triangular inverse CDF hits min, mode and max at u = 0, the mode quantile, and u → 1', () => {
    const d = { kind: 'triangular', min: 8, mode: 9, max: 15 } as const;
    expect(createSampler(d, () => 0)()).toBe(8);
    expect(createSampler(d, () => 1 / 7)()).toBeCloseTo(9, 12);
    expect(createSampler(d, () => 1 - 2 ** -32)()).toBeCloseTo(15, 3);
  });
});
